import { Op, type Transaction } from 'sequelize';
import type { ResultsSnapshot } from '@shared/schemas/results';
import { resultsPublishedEmail } from '@templates/email/results-published';
import { config } from '../../config';
import { queueMail } from '../../mail/outbox';
import { Build } from '../../models/build';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { User } from '../../models/user';
import { ownResultsOf } from './own-results';

/** One results e-mail per judged car to its owner, queued in the publishing transaction (at most one per car, ever). */
export async function mailResultsToEntrants(eventId: number, snapshot: ResultsSnapshot, transaction: Transaction): Promise<void> {
  const event = await Event.findByPk(eventId, { attributes: ['id', 'name'], transaction });
  const ids = snapshot.entries.map((e) => e.entryId);
  if (!event || !ids.length) return;
  const entries = await Entry.findAll({
    where: { id: { [Op.in]: ids } },
    include: [
      { model: User, as: 'owner', attributes: ['email', 'name'] },
      { model: Build, as: 'build', attributes: ['title'] },
      { model: EventClass, as: 'eventClass', attributes: ['name'] },
    ],
    order: [['number', 'ASC']],
    transaction,
  });
  // One after another: queries in one transaction share one connection.
  for (const entry of entries) {
    if (!entry.owner) continue;
    const results = await ownResultsOf(snapshot, { entryId: entry.id, eventId, showName: event.name, className: entry.eventClass?.name ?? '' }, transaction);
    const mail = resultsPublishedEmail({ name: entry.owner.name, buildTitle: entry.build?.title ?? '', results, link: `${config.publicBaseUrl}/entries` });
    await queueMail({ to: entry.owner.email, ...mail }, { transaction, dedupeKey: `results:${entry.id}` });
  }
}
