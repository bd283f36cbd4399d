import { instantToWallTime, wallTimeToInstant } from '@shared/calc/time-zone';
import { Build } from '../../models/build';
import { Event } from '../../models/event';
import { EventMembership } from '../../models/event-membership';
import { User } from '../../models/user';
import { createEvent } from '../../services/shows/events';
import { takeLifecycleStep } from '../../services/commands/take-lifecycle-step';
import { addClass } from '../../services/shows/event-classes';
import { confirmEntryPayment, registerEntry } from '../../services/entries/entries';
import { gateCheckIn } from '../../services/show-day/gate';
import { runCardPrint, startCardPrint } from '../../services/show-day/card-prints';
import { DEMO_SHOW_CLASSES } from './shows';

const DAY = 86400_000;

/** A third invented show, on its show day today: the gate is open, some cars are in, the numbered cards are printed. */
export const DEMO_SHOW_DAY_SHOW = {
  name: 'Cinder Lane Show & Shine',
  slug: 'cinder-lane-show-and-shine',
  venueName: 'Cinder Lane depot yard',
  venueAddress: 'Cinder Lane, Millpond Valley',
  timeZone: 'America/Chicago',
  capacity: null,
  entryFee: 2000,
  currency: 'USD',
  description: 'A one-day show and shine in the old depot yard. Gates open at 8; the cards at the windshields carry each car’s number and QR code.',
} as const;

const ENTRANTS = [
  ['marisol.tenney@placard.test', '1936 Three-Window Coupe', 0, 'in'],
  ['owner@placard.test', '1967 Fastback', 1, 'in'],
  ['ivo.brandt@placard.test', '1955 Gasser', 1, 'paid'],
  ['reuben.salas@placard.test', '1978 Lowrider Sedan', 1, 'in'],
  ['ivo.brandt@placard.test', '1957 Wagon', 2, 'paid'],
  ['june.okafor@placard.test', '1969 Muscle Coupe', 1, 'unpaid'],
  ['reuben.salas@placard.test', '1972 Short-Bed Pickup', 2, 'paid'],
  ['marisol.tenney@placard.test', '1949 Fastback Sedan', 1, 'paid'],
] as const;

/**
 * Puts the demo on show day: a show happening today with its gate open, three cars checked in, the
 * rest paid but not arrived (one unpaid, for the gate's "take cash"), and a finished bulk print of
 * the numbered cards whose PDF the organiser can download from the entries page.
 */
export async function seedShowDay(): Promise<void> {
  await Event.destroy({ where: { slug: DEMO_SHOW_DAY_SHOW.slug } }); // a half-finished earlier run starts again
  const person = async (email: string) => (await User.findOne({ where: { email } }))!;
  const organiser = await person('organiser@placard.test');
  const now = Date.now();
  // Made as a show still taking entries, then walked to show day, then dated today on its own clock.
  const show = await createEvent(organiser, {
    ...DEMO_SHOW_DAY_SHOW,
    asksFor: ['plate'], // the show's insurer wants each car's plate: entrants agree when entering
    startsAt: new Date(now + 2 * DAY).toISOString(),
    endsAt: new Date(now + 2 * DAY + 10 * 3600_000).toISOString(),
    registrationOpensAt: new Date(now - DAY).toISOString(),
    registrationClosesAt: new Date(now + DAY).toISOString(),
    refundRule: { fullRefundUntil: null, afterwardsPercent: 0 },
  });
  const classes = [];
  for (const c of DEMO_SHOW_CLASSES.slice(0, 3)) classes.push(await addClass(show.id, organiser, { ...c, capacity: null }));
  for (const [email, role] of [['coorganiser@placard.test', 'organiser'], ['gate@placard.test', 'gate']] as const) {
    await EventMembership.findOrCreate({ where: { eventId: show.id, userId: (await person(email)).id, role } });
  }
  await takeLifecycleStep(show.id, organiser, 'open_registration');
  const arrived = [];
  for (const [email, title, cls, state] of ENTRANTS) {
    const build = await Build.findOne({ where: { title } });
    if (!build) continue;
    const entry = await registerEntry(await person(email), show.id, { buildId: build.id, classId: classes[cls]!.id, shares: ['plate'] });
    if (state !== 'unpaid') await confirmEntryPayment(entry.id, `demo_pay_cinder_${entry.id}`);
    if (state === 'in') arrived.push(entry.number!);
  }
  await takeLifecycleStep(show.id, organiser, 'close_registration');
  await takeLifecycleStep(show.id, organiser, 'open_gate');
  const gate = await person('gate@placard.test');
  for (const number of arrived) await gateCheckIn(show, number, false, gate);

  // Today on the show's own clock (not the server's), 08:00 to 18:00; loaded outside those hours, on now
  // all the same: from the hour before, for ten hours, so the gate is open while the show is on.
  const day = instantToWallTime(new Date(now).toISOString(), DEMO_SHOW_DAY_SHOW.timeZone).slice(0, 10);
  const today = (time: string) => new Date(wallTimeToInstant(`${day}T${time}`, DEMO_SHOW_DAY_SHOW.timeZone));
  const onNow = now >= today('08:00').getTime() && now < today('17:00').getTime();
  const startsAt = onNow ? today('08:00') : new Date(Math.floor(now / 3600_000) * 3600_000 - 3600_000);
  await Event.update(
    {
      startsAt,
      endsAt: new Date(startsAt.getTime() + 10 * 3600_000),
      registrationOpensAt: new Date(today('09:00').getTime() - 30 * DAY),
      registrationClosesAt: new Date(today('23:59').getTime() - 2 * DAY),
    },
    { where: { id: show.id } },
  );

  // The organiser printed the numbered cards last night: drawn here, so the file is there at once
  // (the queued job finds the print finished and does nothing).
  const { print } = await startCardPrint((await Event.findByPk(show.id))!, null, organiser);
  await runCardPrint(print.id);
}
