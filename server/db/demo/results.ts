import { randomUUID } from 'node:crypto';
import { Op } from 'sequelize';
import { Build } from '../../models/build';
import { Criterion } from '../../models/criterion';
import { Entry } from '../../models/entry';
import { Event } from '../../models/event';
import { EventClass } from '../../models/event-class';
import { User } from '../../models/user';
import { assignJudge } from '../../services/judging/judge-assignments';
import { submitScores } from '../../services/judging/scores';

/**
 * The finished demo show's judging, before its results are published: two more cars that came on
 * the day, three judges' sheets for every car and a few comments. The sheets are invented so the
 * published results show each rule at work (sheet lines: paint, engine bay, chassis, interior,
 * workmanship, stance; weights 1.5, 1.25, 1, 1, 1.5, 1; tie-breaks paint, engine bay, chassis):
 *  - best of show: the 1963 Split-Window Coupe (109.83), which leaves its class;
 *  - post-war: the 1949 Fastback Sedan and 1978 Lowrider Sedan both total 96.00; the fastback's
 *    better paint mean (16 against 15) breaks the tie: "tie broken on Paint and bodywork";
 *  - early iron: the 1932 Highboy Roadster and 1936 Three-Window Coupe equal on the total (102.50)
 *    and on every tie-break line: a shared 1st place, two certificates;
 *  - trucks and wagons: the 1972 Short-Bed Pickup ahead of the 1957 Wagon.
 */
const SHEETS: Record<string, [number[], number[], number[]]> = {
  '1963 Split-Window Coupe': [[18, 17, 13, 13, 18, 9], [17, 18, 12, 14, 17, 9], [19, 17, 13, 13, 18, 8]],
  '1949 Fastback Sedan': [[17, 14, 12, 12, 15, 8], [16, 15, 11, 12, 15, 8], [15, 13, 13, 12, 15, 8]],
  '1978 Lowrider Sedan': [[15, 14, 12, 12, 16, 8], [14, 14, 12, 13, 16, 8], [16, 14, 12, 11, 16, 8]],
  '1932 Highboy Roadster': [[17, 16, 13, 11, 16, 9], [18, 15, 13, 11, 17, 9], [16, 17, 13, 11, 15, 9]],
  '1936 Three-Window Coupe': [[17, 16, 14, 12, 16, 8], [17, 16, 12, 12, 16, 8], [17, 16, 13, 12, 16, 8]],
  '1972 Short-Bed Pickup': [[14, 15, 12, 11, 14, 8], [13, 14, 11, 12, 13, 9], [15, 15, 12, 10, 14, 8]],
  '1957 Wagon': [[12, 13, 11, 12, 13, 7], [13, 12, 12, 11, 12, 8], [12, 13, 10, 12, 13, 7]],
};

/** Comments by judge (index) and line (index); a null line is the comment on the whole car. */
const COMMENTS: Array<{ car: string; judge: number; line: number | null; text: string }> = [
  { car: '1963 Split-Window Coupe', judge: 0, line: 0, text: 'Deep, even paint with crisp panel gaps all round.' },
  { car: '1963 Split-Window Coupe', judge: 2, line: null, text: 'The most complete car on the field: nothing left unfinished.' },
  { car: '1949 Fastback Sedan', judge: 0, line: 0, text: 'Long, straight sides; the paint lays down beautifully.' },
  { car: '1978 Lowrider Sedan', judge: 1, line: 4, text: 'Fine pinstriping and tidy hydraulic plumbing in the trunk.' },
  { car: '1932 Highboy Roadster', judge: 1, line: 1, text: 'Clean engine bay; route the fuel line away from the headers.' },
  { car: '1936 Three-Window Coupe', judge: 0, line: null, text: 'Period-correct and well sorted. A hard car to separate from the roadster.' },
  { car: '1972 Short-Bed Pickup', judge: 2, line: 3, text: 'Seat covers are fresh; the dash pad is cracked.' },
];

/** Two cars checked in on the day, as a gate walk-up with cash leaves them: paid, numbered, in. */
const WALK_UPS = [
  { ownerEmail: 'marisol.tenney@placard.test', title: '1936 Three-Window Coupe', classIndex: 0 },
  { ownerEmail: 'ivo.brandt@placard.test', title: '1957 Wagon', classIndex: 2 },
];

export async function seedFinishedShowJudging(eventId: number, organiser: { id: number }): Promise<void> {
  const event = (await Event.findByPk(eventId))!;
  const classes = await EventClass.findAll({ where: { eventId }, order: [['position', 'ASC'], ['id', 'ASC']] });
  for (const w of WALK_UPS) {
    const owner = await User.findOne({ where: { email: w.ownerEmail } });
    const build = await Build.findOne({ where: { title: w.title } });
    if (!owner || !build) continue;
    const number = (event.lastEntryNumber ?? 0) + 1;
    await Entry.create({
      eventId, buildId: build.id, classId: classes[w.classIndex]!.id, ownerId: owner.id, number, status: 'checked_in',
      feeAmount: event.entryFee, currency: event.currency, paymentRef: `demo_cash_spring_${number}`, paidAt: new Date(), paidAmount: event.entryFee, checkedInAt: new Date(),
    });
    await event.update({ lastEntryNumber: number });
  }

  const judges = await User.findAll({ where: { email: { [Op.in]: ['judge@placard.test', 'judge2@placard.test', 'judge3@placard.test'] } }, order: [['email', 'ASC']] });
  const criteria = await Criterion.findAll({ where: { eventId }, order: [['position', 'ASC'], ['id', 'ASC']] });
  const entries = await Entry.findAll({ where: { eventId, status: { [Op.in]: ['confirmed', 'checked_in'] } }, include: [{ model: Build, as: 'build', attributes: ['title'] }] });
  // Sheets were filled in on the afternoon of the show, a minute apart.
  let at = Date.now() - 40 * 86400_000;
  for (const [j, judge] of judges.entries()) {
    await assignJudge(eventId, judge.id, { allClasses: true, classIds: [] }, organiser);
    for (const entry of entries) {
      const title = entry.build?.title ?? '';
      const points = SHEETS[title]?.[j];
      if (!points) continue;
      const deviceTime = () => new Date((at += 60_000)).toISOString();
      const comments = COMMENTS.filter((c) => c.car === title && c.judge === j);
      const scores = criteria.map((c, i) => ({ clientId: randomUUID(), deviceTime: deviceTime(), entryId: entry.id, criterionId: c.id, points: points[i]!, comment: comments.find((x) => x.line === i)?.text ?? '' }));
      const notes = comments.filter((c) => c.line === null).map((c) => ({ clientId: randomUUID(), deviceTime: deviceTime(), entryId: entry.id, comment: c.text }));
      await submitScores(eventId, judge.id, { scores, notes });
    }
  }
}
