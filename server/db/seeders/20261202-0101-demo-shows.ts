import type { Migration } from '../migrator';
import { DEMO_ACCOUNTS } from '../demo-accounts';
import { DEMO_FINISHED_SHOW, DEMO_OPEN_SHOW, DEMO_SHOW_CLASSES, DEMO_SHOW_SHEET } from '../demo/shows';
import { seedShowDay } from '../demo/show-day';
import { User } from '../../models/user';
import { Build } from '../../models/build';
import { Event } from '../../models/event';
import { EventMembership } from '../../models/event-membership';
import { hashPassword } from '../../auth/passwords';
import { config } from '../../config';
import { wallTimeToInstant } from '@shared/calc/time-zone';
import { startMailCatcher } from '../../mail/catcher';
import { seedJudgingShow } from '../demo/judging';
import { seedFinishedShowJudging } from '../demo/results';
import { createEvent } from '../../services/shows/events';
import { takeLifecycleStep } from '../../services/commands/take-lifecycle-step';
import { addClass } from '../../services/shows/event-classes';
import { saveJudgingSheet } from '../../services/judging/judging-sheet';
import { inviteToEvent } from '../../services/shows/event-people';
import { confirmEntryPayment, registerEntry, withdrawEntry } from '../../services/entries/entries';
import { gateCheckIn } from '../../services/show-day/gate';

const DAY = 86400_000;

/**
 * Two invented shows, dated from the day the demo is seeded so the first is always taking entries:
 * one in registration (paid, unpaid, waiting-list (one offered a freed place) and withdrawn entries, a co-organiser, three
 * judges, a gate account, one invitation still open) and one already finished. Entries go through
 * the same services as the API, so the caught mailbox holds the notices of those flows.
 */
export const up: Migration = async () => {
  for (const a of DEMO_ACCOUNTS) {
    if (await User.findOne({ where: { email: a.email } })) continue;
    await User.create({ email: a.email, name: a.name, passwordHash: await hashPassword(a.password), isSiteAdmin: a.isSiteAdmin, mayOrganise: a.mayOrganise });
  }
  // A run that failed half-way left part of the shows behind: start them again from nothing.
  await Event.destroy({ where: { slug: [DEMO_OPEN_SHOW.slug, DEMO_FINISHED_SHOW.slug] } });
  await withDemoMailCatcher(seedShows);
};

async function seedShows() {
  const person = async (email: string) => (await User.findOne({ where: { email } }))!;
  const build = async (title: string) => (await Build.findOne({ where: { title } }))!;
  const organiser = await person('organiser@placard.test');
  const now = Date.now();
  // Round times on the show's own clock: "in 30 days at 08:00", not whatever minute the demo was loaded.
  const at = (days: number, time: string, timeZone: string) => wallTimeToInstant(`${new Date(now + days * DAY).toISOString().slice(0, 10)}T${time}`, timeZone);

  // The show taking entries.
  const open = await createEvent(organiser, {
    ...DEMO_OPEN_SHOW,
    asksFor: [],
    startsAt: at(30, '08:00', DEMO_OPEN_SHOW.timeZone),
    endsAt: at(31, '17:00', DEMO_OPEN_SHOW.timeZone),
    registrationOpensAt: at(-10, '09:00', DEMO_OPEN_SHOW.timeZone),
    registrationClosesAt: at(23, '23:59', DEMO_OPEN_SHOW.timeZone),
    refundRule: { fullRefundUntil: at(16, '23:59', DEMO_OPEN_SHOW.timeZone), afterwardsPercent: 50 },
  });
  const classes = [];
  for (const c of DEMO_SHOW_CLASSES) classes.push(await addClass(open.id, organiser, { ...c, description: c.description }));
  await saveJudgingSheet(open.id, organiser, { criteria: DEMO_SHOW_SHEET });
  await addPeople(open.id, organiser.id);
  await takeLifecycleStep(open.id, organiser, 'open_registration');
  const [early, postwar, trucks] = classes as [(typeof classes)[0], (typeof classes)[0], (typeof classes)[0], (typeof classes)[0]];
  const enter = async (ownerEmail: string, title: string, classId: number) => registerEntry(await person(ownerEmail), open.id, { buildId: (await build(title)).id, classId, shares: [] });
  const fastback = await enter('owner@placard.test', '1967 Fastback', postwar.id);
  await confirmEntryPayment(fastback.id, 'demo_pay_fastback');
  await enter('owner@placard.test', '1932 Highboy Roadster', early.id); // awaiting payment
  const coupe = await enter('marisol.tenney@placard.test', '1936 Three-Window Coupe', early.id);
  await confirmEntryPayment(coupe.id, 'demo_pay_coupe');
  await enter('ivo.brandt@placard.test', '1955 Gasser', postwar.id); // awaiting payment
  const pickup = await enter('reuben.salas@placard.test', '1972 Short-Bed Pickup', trucks.id);
  await confirmEntryPayment(pickup.id, 'demo_pay_pickup');
  await enter('ivo.brandt@placard.test', '1957 Wagon', trucks.id); // the class holds one: waiting list
  // The pickup's owner withdraws: the freed place is offered to the wagon, with a deadline the organiser sees in the table.
  await withdrawEntry(pickup.id, await person('reuben.salas@placard.test'), false);
  const muscle = await enter('june.okafor@placard.test', '1969 Muscle Coupe', postwar.id);
  await confirmEntryPayment(muscle.id, 'demo_pay_muscle');
  await withdrawEntry(muscle.id, await person('june.okafor@placard.test'), false); // full refund: before the date; sent back in seeder 20261207-0101
  const split = await enter('june.okafor@placard.test', '1963 Split-Window Coupe', postwar.id);
  await confirmEntryPayment(split.id, 'demo_pay_split');
  await inviteToEvent(open.id, organiser, 'second.gate@placard.test', 'gate'); // still open

  // The finished show: entered while open, then walked through show day and judging to the end.
  const done = await createEvent(organiser, {
    ...DEMO_FINISHED_SHOW,
    asksFor: [],
    startsAt: new Date(now + 2 * DAY).toISOString(),
    endsAt: new Date(now + 2 * DAY + 9 * 3600_000).toISOString(),
    registrationOpensAt: new Date(now - DAY).toISOString(),
    registrationClosesAt: new Date(now + DAY).toISOString(),
    refundRule: { fullRefundUntil: null, afterwardsPercent: 0 },
  });
  const doneClasses = [];
  for (const c of DEMO_SHOW_CLASSES.slice(0, 3)) doneClasses.push(await addClass(done.id, organiser, { ...c, capacity: null }));
  await saveJudgingSheet(done.id, organiser, { criteria: DEMO_SHOW_SHEET.slice(0, 6) });
  await addPeople(done.id, organiser.id);
  await takeLifecycleStep(done.id, organiser, 'open_registration');
  const gate = await person('gate@placard.test');
  const entered = [];
  for (const [email, title, i] of [
    ['marisol.tenney@placard.test', '1949 Fastback Sedan', 1],
    ['reuben.salas@placard.test', '1978 Lowrider Sedan', 1],
    ['owner@placard.test', '1932 Highboy Roadster', 0],
    ['june.okafor@placard.test', '1963 Split-Window Coupe', 1],
    ['reuben.salas@placard.test', '1972 Short-Bed Pickup', 2],
  ] as const) {
    const e = await registerEntry(await person(email), done.id, { buildId: (await build(title)).id, classId: doneClasses[i]!.id, shares: [] });
    await confirmEntryPayment(e.id, `demo_pay_spring_${e.id}`);
    entered.push(e);
  }
  await takeLifecycleStep(done.id, organiser, 'close_registration');
  await takeLifecycleStep(done.id, organiser, 'open_gate');
  for (const e of entered) await gateCheckIn(done, e.number!, false, gate);
  await takeLifecycleStep(done.id, organiser, 'start_judging');
  await seedFinishedShowJudging(done.id, organiser);
  await takeLifecycleStep(done.id, organiser, 'publish_results');
  // Move it into the past, keeping the order of its dates.
  await Event.update(
    {
      startsAt: new Date(at(-40, '09:00', DEMO_FINISHED_SHOW.timeZone)),
      endsAt: new Date(at(-40, '18:00', DEMO_FINISHED_SHOW.timeZone)),
      registrationOpensAt: new Date(at(-70, '09:00', DEMO_FINISHED_SHOW.timeZone)),
      registrationClosesAt: new Date(at(-42, '23:59', DEMO_FINISHED_SHOW.timeZone)),
    },
    { where: { id: done.id } },
  );
  await seedShowDay(); // a third show on its show day: gate open, cars arriving, numbered cards printed
  await seedJudgingShow(organiser);
}

/** The co-organiser, three judges and the gate account, as the show's members. */
async function addPeople(eventId: number, _organiserId: number) {
  const roles = [
    ['coorganiser@placard.test', 'organiser'],
    ['judge@placard.test', 'judge'],
    ['judge2@placard.test', 'judge'],
    ['judge3@placard.test', 'judge'],
    ['gate@placard.test', 'gate'],
  ] as const;
  for (const [email, role] of roles) {
    const user = await User.findOne({ where: { email } });
    if (user) await EventMembership.findOrCreate({ where: { eventId, userId: user.id, role } });
  }
}

/**
 * The notices of the demo flows land in the caught mailbox. Seeding runs before the server starts
 * its catcher, so the catcher is started here for the run when nothing listens on its port yet.
 */
async function withDemoMailCatcher(fn: () => Promise<void>) {
  const wanted = config.demoMode && config.smtpUrl === `smtp://127.0.0.1:${config.mailCatcherPort}`;
  const catcher = wanted ? await startMailCatcher(config.mailCatcherPort).catch(() => null) : null;
  try {
    await fn();
  } finally {
    await new Promise<void>((resolve) => (catcher ? catcher.close(() => resolve()) : resolve()));
  }
}
