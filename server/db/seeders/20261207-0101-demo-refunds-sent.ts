import type { Migration } from '../migrator';
import { Op } from 'sequelize';
import { DEMO_OPEN_SHOW } from '../demo/shows';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { recordEntryRefund } from '../../services/entries/entry-refunds';

/** The two entries withdrawn from the show taking entries, whose fees (paid online) went back in full. */
const TITLES = ['1972 Short-Bed Pickup', '1969 Muscle Coupe'];

/**
 * A refund done, as the refund worker records it when the payment service has made it: the money
 * summary counts it as refunded, the entry's history says so and the entrant's notice is in the caught
 * mailbox. The demo's payments never went through the payment service (no checkout to refund), so the
 * worker would never send these; this records them as sent. Runs once, on a new demo or an older one.
 */
export const up: Migration = async () => {
  const show = await Event.findOne({ where: { slug: DEMO_OPEN_SHOW.slug } });
  if (!show) return;
  for (const title of TITLES) {
    const builds = await Build.findAll({ where: { title }, attributes: ['id'] });
    const entry = await Entry.findOne({
      where: { eventId: show.id, buildId: builds.map((b) => b.id), status: 'withdrawn', refundRef: null, refundDue: { [Op.gt]: 0 } },
    });
    if (entry) await recordEntryRefund(entry.id, { id: `demo_refund_${entry.id}`, amountMinor: entry.refundDue! });
  }
};
