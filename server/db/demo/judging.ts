import { randomBytes, randomUUID } from 'node:crypto';
import { wallTimeToInstant } from '@shared/calc/time-zone';
import type { ScoreSubmitInput } from '@shared/schemas/judging';
import { User } from '../../models/user';
import { Build } from '../../models/build';
import { Event } from '../../models/event';
import type { Entry } from '../../models/entry';
import { EventMembership } from '../../models/event-membership';
import { createEvent } from '../../services/shows/events';
import { takeLifecycleStep } from '../../services/commands/take-lifecycle-step';
import { addClass } from '../../services/shows/event-classes';
import { saveJudgingSheet } from '../../services/judging/judging-sheet';
import { registerEntry } from '../../services/entries/entries';
import { gateCheckIn } from '../../services/show-day/gate';
import { assignJudge } from '../../services/judging/judge-assignments';
import { submitScores } from '../../services/judging/scores';
import { castVote, setVotingWindow } from '../../services/results/peoples-choice';
import { DEMO_SHOW_CLASSES, DEMO_SHOW_SHEET } from './shows';

/** The demo's third invented show: on today, being judged, people's choice voting open. */
export const DEMO_JUDGING_SHOW = {
  name: 'Harrow Creek Twilight Show',
  slug: 'harrow-creek-twilight-show',
  venueName: 'Harrow Creek old rail yard',
  venueAddress: 'Depot Street, Harrow Creek',
  timeZone: 'America/Denver',
  capacity: null,
  entryFee: 0,
  currency: 'USD',
  description: 'A free one-day show in the old rail yard, judged through the afternoon. Visitors vote for people’s choice on each car’s page.',
};

// The cars, their owners and classes (indexes into the first three demo classes).
const CARS = [
  ['owner@placard.test', '1932 Highboy Roadster', 0],
  ['marisol.tenney@placard.test', '1936 Three-Window Coupe', 0],
  ['owner@placard.test', '1967 Fastback', 1],
  ['ivo.brandt@placard.test', '1955 Gasser', 1],
  ['june.okafor@placard.test', '1963 Split-Window Coupe', 1],
  ['reuben.salas@placard.test', '1972 Short-Bed Pickup', 2],
  ['ivo.brandt@placard.test', '1957 Wagon', 2],
] as const;

/**
 * Walks the show from entries to judging today: the pickup checked in late (after judging started) and the
 * wagon still expected, three judges with their classes, some sheets finished,
 * one half done and some not started, and a few visitors' votes (three from one address, for the
 * organiser's "void" to act on). Addresses are from the documentation ranges (RFC 5737), never real.
 */
export async function seedJudgingShow(organiser: User): Promise<void> {
  await Event.destroy({ where: { slug: DEMO_JUDGING_SHOW.slug } }); // what a failed run left behind
  const person = async (email: string) => (await User.findOne({ where: { email } }))!;
  const tz = DEMO_JUDGING_SHOW.timeZone;
  const day = (offset: number) => new Date(Date.now() + offset * 86400_000).toISOString().slice(0, 10);
  const show = await createEvent(organiser, {
    ...DEMO_JUDGING_SHOW,
    asksFor: [],
    // Entered while the dates were ahead; moved to today once the show is on (below).
    startsAt: wallTimeToInstant(`${day(2)}T08:00`, tz),
    endsAt: wallTimeToInstant(`${day(2)}T20:00`, tz),
    registrationOpensAt: wallTimeToInstant(`${day(-20)}T09:00`, tz),
    registrationClosesAt: wallTimeToInstant(`${day(1)}T23:59`, tz),
    refundRule: { fullRefundUntil: null, afterwardsPercent: 0 },
  });
  const classes = [];
  for (const c of DEMO_SHOW_CLASSES.slice(0, 3)) classes.push(await addClass(show.id, organiser, { ...c, capacity: null }));
  const sheet = DEMO_SHOW_SHEET.slice(0, 5);
  await saveJudgingSheet(show.id, organiser, { criteria: sheet });
  const judges = await Promise.all(['judge@placard.test', 'judge2@placard.test', 'judge3@placard.test'].map(person));
  for (const j of judges) await EventMembership.findOrCreate({ where: { eventId: show.id, userId: j.id, role: 'judge' } });
  await EventMembership.findOrCreate({ where: { eventId: show.id, userId: (await person('coorganiser@placard.test')).id, role: 'organiser' } });
  await EventMembership.findOrCreate({ where: { eventId: show.id, userId: (await person('gate@placard.test')).id, role: 'gate' } });

  await takeLifecycleStep(show.id, organiser, 'open_registration');
  const entries: Entry[] = [];
  for (const [email, title, c] of CARS) {
    const build = (await Build.findOne({ where: { title } }))!;
    entries.push(await registerEntry(await person(email), show.id, { buildId: build.id, classId: classes[c]!.id, shares: [] }));
  }
  await takeLifecycleStep(show.id, organiser, 'close_registration');
  await takeLifecycleStep(show.id, organiser, 'open_gate');
  const gate = await person('gate@placard.test');
  for (const e of entries.slice(0, 5)) await gateCheckIn(show, e.number!, false, gate); // the wagon never arrived
  await takeLifecycleStep(show.id, organiser, 'start_judging');
  await gateCheckIn(show, entries[5]!.number!, false, gate); // the pickup came late: it joins the judges' lists
  // On now, whatever the hour the demo is loaded: started two hours ago (on the hour), ends in ten.
  const hour = Math.floor(Date.now() / 3600_000) * 3600_000;
  await Event.update(
    {
      startsAt: new Date(hour - 2 * 3600_000),
      endsAt: new Date(hour + 10 * 3600_000),
      registrationOpensAt: new Date(wallTimeToInstant(`${day(-30)}T09:00`, tz)),
      registrationClosesAt: new Date(hour - 26 * 3600_000),
    },
    { where: { id: show.id } },
  );

  // The first judge scores every class, the second early iron and trucks, the third post-war.
  const [all, earlyAndTrucks, postwar] = judges as [User, User, User];
  await assignJudge(show.id, all.id, { allClasses: true, classIds: [] }, organiser);
  await assignJudge(show.id, earlyAndTrucks.id, { allClasses: false, classIds: [classes[0]!.id, classes[2]!.id] }, organiser);
  await assignJudge(show.id, postwar.id, { allClasses: false, classIds: [classes[1]!.id] }, organiser);

  const criteria = (await Event.findByPk(show.id, { include: ['criteria'] }))!.criteria!.sort((a, b) => a.position - b.position);
  const sheetFor = (entryIndex: number, judgeIndex: number, lines: number): ScoreSubmitInput => ({
    scores: criteria.slice(0, lines).map((c, i) => ({
      clientId: randomUUID(),
      deviceTime: new Date(Date.now() - (60 - entryIndex * 5 - i) * 60_000).toISOString(),
      entryId: entries[entryIndex]!.id,
      criterionId: c.id,
      // Invented but plausible: near the top of each line, varied by car, line and judge.
      points: Math.max(0, c.maxPoints - ((entryIndex * 3 + i * 2 + judgeIndex) % 6)),
      comment: i === 0 && judgeIndex === 0 ? ['Deep, even paint; one run under the door handle.', 'Straight panels, crisp gaps.', 'Fresh paint, a few polishing marks.'][entryIndex % 3]! : '',
    })),
    notes: judgeIndex === 0 ? [{ clientId: randomUUID(), deviceTime: new Date().toISOString(), entryId: entries[entryIndex]!.id, comment: 'Owner on hand and knew every part of the build.' }] : [],
  });
  // Finished sheets for four cars and half a sheet for a fifth from the first judge; the second has one
  // car done; the third has not started. The gasser and the pickup have no finished sheet yet.
  for (const i of [0, 1, 2, 4]) await submitScores(show.id, all.id, sheetFor(i, 0, criteria.length));
  await submitScores(show.id, all.id, sheetFor(3, 0, 2));
  await submitScores(show.id, earlyAndTrucks.id, sheetFor(0, 1, criteria.length));

  // A few visitors' votes; three come from one address.
  await setVotingWindow(show.id, true, organiser);
  const votes: Array<[number, string]> = [
    [2, '198.51.100.23'], [2, '203.0.113.7'], [2, '192.0.2.41'], [4, '198.51.100.88'],
    [1, '203.0.113.150'], [4, '192.0.2.200'], [3, '198.51.100.5'], [3, '198.51.100.5'], [3, '198.51.100.5'],
  ];
  for (const [i, address] of votes) {
    const code = (await Build.findByPk(entries[i]!.buildId, { attributes: ['code'] }))!.code;
    await castVote({ code, show: show.slug, voterToken: randomBytes(32).toString('base64url'), address });
  }
}
