import { describe, expect, it } from 'vitest';
import { Score } from '@server/models/score';
import { SheetNote } from '@server/models/sheet-note';
import { apiClient } from '../../support/api-client';
import { signedIn } from '../../support/event-factory';
import { judgeOf, quickJudgeOf, scoreItem, showInJudging } from '../../support/judging-factory';

const minutesAgo = (m: number) => new Date(Date.now() - m * 60_000);

describe('judges and their classes', () => {
  it('lets the organiser give a judge one class or every class; the judge then sees only those cars, in number order', async () => {
    const show = await showInJudging();
    const judge = await judgeOf(show.eventId);
    const url = `/api/events/${show.eventId}/judges/${judge.user.id}/classes`;

    const none = await judge.client.get(`/api/events/${show.eventId}/judging/mine`);
    expect(none.status).toBe(200);
    expect(none.body.cars).toEqual([]);

    const one = await show.organiser.client.put(url, { allClasses: false, classIds: [show.classIds[1]] });
    expect(one.status).toBe(200);
    expect(one.body.judges).toEqual([{ id: judge.user.id, name: 'Jude Judgely', allClasses: false, classIds: [show.classIds[1]] }]);
    const mine = (await judge.client.get(`/api/events/${show.eventId}/judging/mine`)).body;
    expect(mine.cars.map((c: { number: number }) => c.number)).toEqual(show.entries.filter((e) => e.classId === show.classIds[1]).map((e) => e.number));
    expect(mine.criteria.map((c: { name: string; maxPoints: number }) => [c.name, c.maxPoints])).toEqual([['Paint and body', 10], ['Engine bay', 10], ['Interior', 5]]);
    expect(mine.event.judgingOpen).toBe(true);

    expect((await show.organiser.client.put(url, { allClasses: true })).status).toBe(200);
    const all = (await judge.client.get(`/api/events/${show.eventId}/judging/mine`)).body;
    expect(all.cars.map((c: { number: number }) => c.number)).toEqual([1, 2, 3, 4]);
  });

  it('refuses a person who is not a judge, a class of another show, a judge assigning, and anonymous', async () => {
    const show = await showInJudging();
    const other = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    const stranger = await signedIn();
    const notJudge = await show.organiser.client.put(`/api/events/${show.eventId}/judges/${stranger.user.id}/classes`, { allClasses: true });
    expect(notJudge.status).toBe(400);
    expect(notJudge.body.error.fields.judgeId).toMatch(/not a judge/);
    const foreignClass = await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: false, classIds: [other.classIds[0]] });
    expect(foreignClass.status).toBe(400);
    expect(foreignClass.body.error.fields.classIds).toBeDefined();
    const empty = await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: false, classIds: [] });
    expect(empty.body.error.fields.classIds).toMatch(/at least one class/);
    expect((await judge.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true })).status).toBe(403);
    expect((await other.organiser.client.get(`/api/events/${show.eventId}/judges`)).status).toBe(404);
    expect((await (await apiClient()).get(`/api/events/${show.eventId}/judges`)).status).toBe(401);
  });
});

describe('scoring', () => {
  it('records a sheet with comments and answers which items became the stored values', async () => {
    const show = await showInJudging();
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    const car = show.entries[0]!;
    const items = show.criteria.map((c, i) => scoreItem(car.id, c.id, i + 3, new Date(), i === 0 ? 'Deep, even gloss' : ''));
    const note = { clientId: crypto.randomUUID(), deviceTime: new Date().toISOString(), entryId: car.id, comment: 'Tidy car throughout.' };
    const res = await judge.client.post(`/api/events/${show.eventId}/scores`, { scores: items, notes: [note] });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.applied.every((a: { applied: boolean }) => a.applied)).toBe(true);
    const mine = (await judge.client.get(`/api/events/${show.eventId}/judging/mine`)).body;
    expect(mine.scores.map((s: { points: number }) => s.points).sort()).toEqual([3, 4, 5]);
    expect(mine.scores.find((s: { comment: string }) => s.comment)?.comment).toBe('Deep, even gloss');
    expect(mine.notes).toEqual([expect.objectContaining({ entryId: car.id, comment: 'Tidy car throughout.' })]);
  });

  it('refuses points outside 0…max, a line of another show, a car of another show and a car outside the judge’s classes, changing nothing', async () => {
    const show = await showInJudging();
    const other = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: false, classIds: [show.classIds[0]] });
    const mineCar = show.entries.find((e) => e.classId === show.classIds[0])!;
    const otherClassCar = show.entries.find((e) => e.classId === show.classIds[1])!;
    const [paint, , interior] = show.criteria;
    const send = (scores: object[]) => judge.client.post(`/api/events/${show.eventId}/scores`, { scores });

    const tooHigh = await send([scoreItem(mineCar.id, paint!.id, 7), scoreItem(mineCar.id, interior!.id, 6)]);
    expect(tooHigh.status).toBe(400);
    expect(tooHigh.body.error.fields).toEqual({ 'scores.1.points': 'Interior scores 0 to 5 points.' });
    const negative = await send([scoreItem(mineCar.id, paint!.id, -1)]);
    expect(negative.status).toBe(400);
    expect(negative.body.error.fields['scores.0.points']).toMatch(/below 0/);
    const fraction = await send([scoreItem(mineCar.id, paint!.id, 2.5)]);
    expect(fraction.body.error.fields['scores.0.points']).toMatch(/whole number/);

    const foreignLine = await send([scoreItem(mineCar.id, other.criteria[0]!.id, 3)]);
    expect(foreignLine.status).toBe(400);
    expect(foreignLine.body.error.fields['scores.0.criterionId']).toMatch(/not on this show/);
    const foreignCar = await send([scoreItem(other.entries[0]!.id, paint!.id, 3)]);
    expect(foreignCar.status).toBe(400);
    expect(foreignCar.body.error.fields['scores.0.entryId']).toMatch(/not judged in this show/);

    const outside = await send([scoreItem(mineCar.id, paint!.id, 3), scoreItem(otherClassCar.id, paint!.id, 3)]);
    expect(outside.status).toBe(403);
    expect(outside.body.error.message).toMatch(/class you are not judging/);
    const noId = await judge.client.post(`/api/events/${show.eventId}/scores`, { scores: [{ ...scoreItem(mineCar.id, paint!.id, 3), clientId: 'x' }] });
    expect(noId.body.error.fields['scores.0.clientId']).toBeDefined();

    expect(await Score.count({ where: { eventId: show.eventId } })).toBe(0);
  });

  it('lets only the show’s judges score: the organiser, an entrant, another show’s judge and anonymous are refused', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const other = await showInJudging({ carsPerClass: 1 });
    const otherJudge = await judgeOf(other.eventId);
    const body = { scores: [scoreItem(show.entries[0]!.id, show.criteria[0]!.id, 3)] };
    expect((await show.organiser.client.post(`/api/events/${show.eventId}/scores`, body)).status).toBe(403);
    expect((await show.owner.client.post(`/api/events/${show.eventId}/scores`, body)).status).toBe(404);
    expect((await otherJudge.client.post(`/api/events/${show.eventId}/scores`, body)).status).toBe(404);
    expect((await otherJudge.client.get(`/api/events/${show.eventId}/judging/mine`)).status).toBe(404);
    expect((await (await apiClient()).post(`/api/events/${show.eventId}/scores`, body)).status).toBe(401);
    expect(await Score.count({ where: { eventId: show.eventId } })).toBe(0);
  });

  it('never shows a judge another judge’s scores or comments', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const [a, b] = [await judgeOf(show.eventId, 'Ada'), await judgeOf(show.eventId, 'Bo')];
    for (const j of [a, b]) await show.organiser.client.put(`/api/events/${show.eventId}/judges/${j.user.id}/classes`, { allClasses: true });
    const car = show.entries[0]!;
    expect((await a.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(car.id, show.criteria[0]!.id, 9, new Date(), 'Only Ada wrote this')], notes: [{ clientId: crypto.randomUUID(), deviceTime: new Date().toISOString(), entryId: car.id, comment: 'Ada’s note' }] })).status).toBe(200);
    const seenByB = await b.client.get(`/api/events/${show.eventId}/judging/mine`);
    expect(seenByB.body.scores).toEqual([]);
    expect(seenByB.body.notes).toEqual([]);
    expect(JSON.stringify(seenByB.body)).not.toMatch(/Only Ada|Ada’s note/);
  });
});

describe('newest wins, replays change nothing', () => {
  it('keeps the newer score when an older one arrives late, and ignores a repeated send', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    const car = show.entries[0]!;
    const paint = show.criteria[0]!;
    const send = (scores: object[]) => judge.client.post(`/api/events/${show.eventId}/scores`, { scores });

    const older = scoreItem(car.id, paint.id, 4, minutesAgo(10), 'first look');
    const newer = scoreItem(car.id, paint.id, 8, minutesAgo(2), 'after a second walk round');
    expect((await send([newer])).body.applied).toEqual([{ clientId: newer.clientId, applied: true }]);
    // The phone that queued the older score reconnects later: it must not roll the newer one back.
    expect((await send([older])).body.applied).toEqual([{ clientId: older.clientId, applied: false }]);
    // A retried request (the answer was lost on the way back) changes nothing either.
    expect((await send([newer])).body.applied).toEqual([{ clientId: newer.clientId, applied: false }]);

    const rows = await Score.findAll({ where: { eventId: show.eventId, judgeId: judge.user.id } });
    expect(rows.map((r) => [r.points, r.comment, r.clientId])).toEqual([[8, 'after a second walk round', newer.clientId]]);

    const newest = scoreItem(car.id, paint.id, 6, minutesAgo(1));
    expect((await send([newest])).body.applied[0].applied).toBe(true);
    expect((await Score.findAll({ where: { eventId: show.eventId } })).map((r) => r.points)).toEqual([6]);
  });

  it('applies the same rule to car comments', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    const car = show.entries[0]!;
    const note = (comment: string, at: Date) => ({ clientId: crypto.randomUUID(), deviceTime: at.toISOString(), entryId: car.id, comment });
    await judge.client.post(`/api/events/${show.eventId}/scores`, { notes: [note('newer words', minutesAgo(1))] });
    await judge.client.post(`/api/events/${show.eventId}/scores`, { notes: [note('older words', minutesAgo(5))] });
    expect((await SheetNote.findAll({ where: { eventId: show.eventId } })).map((n) => n.comment)).toEqual(['newer words']);
  });

  it('loses nothing when 50 judges send their sheets at once, each with a duplicate in flight', async () => {
    const show = await showInJudging({ carsPerClass: 2 });
    const judges = [];
    for (let i = 0; i < 50; i += 10) judges.push(...(await Promise.all(Array.from({ length: 10 }, (_, k) => quickJudgeOf(show.eventId, `Judge ${i + k + 1}`)))));
    for (const j of judges) expect((await show.organiser.client.put(`/api/events/${show.eventId}/judges/${j.user.id}/classes`, { allClasses: true })).status).toBe(200);

    // Judge k gives every line (k + entry + line) modulo the line's max, so every stored value can be checked.
    const expected = (k: number, entryIndex: number, lineIndex: number) => (k + entryIndex + lineIndex) % (show.criteria[lineIndex]!.maxPoints + 1);
    const sheets = judges.map((_, k) => show.entries.flatMap((e, ei) => show.criteria.map((c, li) => scoreItem(e.id, c.id, expected(k, ei, li)))));
    const sends = judges.flatMap((j, k) => {
      const once = j.client.post(`/api/events/${show.eventId}/scores`, { scores: sheets[k] });
      return k % 2 ? [once, j.client.post(`/api/events/${show.eventId}/scores`, { scores: sheets[k] })] : [once];
    });
    const answers = await Promise.all(sends);
    expect(answers.map((a) => a.status).filter((s) => s !== 200)).toEqual([]);

    const rows = await Score.findAll({ where: { eventId: show.eventId } });
    expect(rows).toHaveLength(50 * show.entries.length * show.criteria.length);
    judges.forEach((j, k) => {
      show.entries.forEach((e, ei) =>
        show.criteria.forEach((c, li) => {
          const row = rows.filter((r) => r.judgeId === j.user.id && r.entryId === e.id && r.criterionId === c.id);
          expect(row.map((r) => r.points)).toEqual([expected(k, ei, li)]);
        }),
      );
    });
    const progress = (await show.organiser.client.get(`/api/events/${show.eventId}/judging/progress`)).body.progress;
    expect(progress.byClass.map((c: { bySheets: unknown }) => c.bySheets)).toEqual([[{ sheets: 50, cars: 2 }], [{ sheets: 50, cars: 2 }]]);
  });
});

describe('one clock: the server orders a judge’s phones', () => {
  const dayFast = () => new Date(Date.now() + 24 * 3600_000 - 60_000); // just inside the day a phone may be ahead

  it('lets a later honest correction from a second phone win over a phone a day fast, and tells the replaced phone', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    const car = show.entries[0]!;
    const paint = show.criteria[0]!;
    const [phoneA, phoneB] = [crypto.randomUUID(), crypto.randomUUID()];
    const send = (deviceId: string, scores: object[]) => judge.client.post(`/api/events/${show.eventId}/scores`, { deviceId, scores });

    const fast = { ...scoreItem(car.id, paint.id, 3, dayFast(), 'first look'), sequence: 1 };
    expect((await send(phoneA, [fast])).body.applied).toEqual([{ clientId: fast.clientId, applied: true }]);
    const honest = { ...scoreItem(car.id, paint.id, 8, new Date(), 'after a second walk round'), sequence: 1 };
    expect((await send(phoneB, [honest])).body.applied).toEqual([{ clientId: honest.clientId, applied: true }]);
    expect((await Score.findAll({ where: { eventId: show.eventId } })).map((r) => [r.points, r.clientId])).toEqual([[8, honest.clientId]]);

    // Phone A sends its line again (its answer was lost): nothing changes, and it is told another phone replaced it.
    expect((await send(phoneA, [fast])).body.applied).toEqual([{ clientId: fast.clientId, applied: false, replacedByOtherDevice: true }]);
    const mine = (await judge.client.get(`/api/events/${show.eventId}/judging/mine`)).body;
    expect(mine.scores.map((s: { points: number; deviceId: string }) => [s.points, s.deviceId])).toEqual([[8, phoneB]]);

    // A later tap on phone A (its clock still a day fast, or now set right) is newer again: the server received it last.
    const fixed = { ...scoreItem(car.id, paint.id, 6, new Date()), sequence: 2 };
    expect((await send(phoneA, [fixed])).body.applied).toEqual([{ clientId: fixed.clientId, applied: true }]);
    expect((await Score.findAll({ where: { eventId: show.eventId } })).map((r) => r.points)).toEqual([6]);
  });

  it('orders one phone’s own queue by its sequence, not its clock, for scores and comments alike', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    const car = show.entries[0]!;
    const phone = crypto.randomUUID();
    const send = (body: object) => judge.client.post(`/api/events/${show.eventId}/scores`, { deviceId: phone, ...body });
    // Tap 1 was made while the clock was a day fast; tap 2 after it was set right, so its time is earlier.
    const first = { ...scoreItem(car.id, show.criteria[0]!.id, 4, dayFast()), sequence: 1 };
    const second = { ...scoreItem(car.id, show.criteria[0]!.id, 9, new Date()), sequence: 2 };
    expect((await send({ scores: [second] })).body.applied[0].applied).toBe(true);
    expect((await send({ scores: [first] })).body.applied).toEqual([{ clientId: first.clientId, applied: false }]);
    expect((await Score.findAll({ where: { eventId: show.eventId } })).map((r) => r.points)).toEqual([9]);

    const note = (comment: string, sequence: number, at: Date) => ({ clientId: crypto.randomUUID(), deviceTime: at.toISOString(), sequence, entryId: car.id, comment });
    await send({ notes: [note('set right, later', 4, minutesAgo(1))] });
    await send({ notes: [note('day fast, earlier', 3, dayFast())] });
    expect((await SheetNote.findAll({ where: { eventId: show.eventId } })).map((n) => n.comment)).toEqual(['set right, later']);
  });
});

describe('progress and closing judging', () => {
  it('shows per class how many cars have how many sheets, per judge what is left, and refuses scores after closing with a message', async () => {
    const show = await showInJudging();
    const [a, b] = [await judgeOf(show.eventId, 'Ada'), await judgeOf(show.eventId, 'Bo')];
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${a.user.id}/classes`, { allClasses: true });
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${b.user.id}/classes`, { allClasses: false, classIds: [show.classIds[0]] });
    const [car1, car2] = show.entries;
    await a.client.post(`/api/events/${show.eventId}/scores`, { scores: show.criteria.map((c) => scoreItem(car1!.id, c.id, 3)) });
    await a.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(car2!.id, show.criteria[0]!.id, 3)] });
    await b.client.post(`/api/events/${show.eventId}/scores`, { scores: show.criteria.map((c) => scoreItem(car1!.id, c.id, 5)) });

    const progress = (await show.organiser.client.get(`/api/events/${show.eventId}/judging/progress`)).body.progress;
    expect(progress.byClass[0]).toMatchObject({ cars: 2, bySheets: [{ sheets: 0, cars: 1 }, { sheets: 2, cars: 1 }] });
    expect(progress.byClass[1]).toMatchObject({ cars: 2, bySheets: [{ sheets: 0, cars: 2 }] });
    expect(progress.byJudge).toEqual([
      expect.objectContaining({ name: 'Ada', cars: 4, scored: 1, partly: 1, notYet: 2, leftNumbers: [2, 3, 4] }),
      expect.objectContaining({ name: 'Bo', cars: 2, scored: 1, partly: 0, notYet: 1, leftNumbers: [2] }),
    ]);
    expect((await a.client.get(`/api/events/${show.eventId}/judging/progress`)).status).toBe(403);

    const closed = await show.organiser.client.post(`/api/events/${show.eventId}/judging/close`);
    expect(closed.status).toBe(200);
    expect(closed.body.progress.judgingOpen).toBe(false);
    const late = await a.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(car2!.id, show.criteria[1]!.id, 9)] });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/Judging is closed/);
    expect((await a.client.get(`/api/events/${show.eventId}/judging/mine`)).body.event).toMatchObject({ judgingOpen: false, closedReason: expect.stringMatching(/Judging is closed/) });
    expect(await Score.count({ where: { eventId: show.eventId } })).toBe(7);

    expect((await a.client.post(`/api/events/${show.eventId}/judging/close`)).status).toBe(403);
    expect((await show.organiser.client.post(`/api/events/${show.eventId}/judging/reopen`)).status).toBe(200);
    expect((await a.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(car2!.id, show.criteria[1]!.id, 9)] })).status).toBe(200);
  });

  it('refuses scores once results are published', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    expect((await show.organiser.client.post(`/api/events/${show.eventId}/lifecycle`, { action: 'publish_results', acknowledgeWarnings: true })).status).toBe(200);
    const late = await judge.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(show.entries[0]!.id, show.criteria[0]!.id, 3)] });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/Results are published/);
  });
});

describe('results review', () => {
  it('places cars from finished sheets only (weighted means), takes best of show out of its class by default, and is for organisers only', async () => {
    const show = await showInJudging({ carsPerClass: 3 });
    const [a, b] = [await judgeOf(show.eventId, 'Ada'), await judgeOf(show.eventId, 'Bo')];
    for (const j of [a, b]) await show.organiser.client.put(`/api/events/${show.eventId}/judges/${j.user.id}/classes`, { allClasses: true });
    const [c1, c2, c3] = show.entries.filter((e) => e.classId === show.classIds[0]);
    const sheet = (entryId: number, points: number[]) => show.criteria.map((c, i) => scoreItem(entryId, c.id, points[i]!));
    // Weights 2, 1.5, 1. Car 1: Ada 8,6,4 and Bo 6,6,4 → means 7,6,4 → 2×7 + 1.5×6 + 4 = 27.
    await a.client.post(`/api/events/${show.eventId}/scores`, { scores: [...sheet(c1!.id, [8, 6, 4]), ...sheet(c2!.id, [8, 4, 4]), ...sheet(c3!.id, [10, 10, 5])] });
    await b.client.post(`/api/events/${show.eventId}/scores`, { scores: [...sheet(c1!.id, [6, 6, 4]), ...sheet(c2!.id, [6, 8, 3])] });
    // Bo's sheet for car 3 is half done: a draft, not counted.
    await b.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(c3!.id, show.criteria[0]!.id, 0)] });
    // Car 2: means 7, 6, 3.5 → 14 + 9 + 3.5 = 26.5. Car 3: Ada only, 20 + 15 + 5 = 40.
    const review = await show.organiser.client.get(`/api/events/${show.eventId}/results/review`);
    expect(review.status).toBe(200);
    const cls = review.body.review.classes.find((c: { classId: number }) => c.classId === show.classIds[0]);
    // Car 3 is best of show and (by the default rule) leaves its class place.
    expect(review.body.review.bestOfShow.map((r: { number: number; totalShown: string }) => [r.number, r.totalShown])).toEqual([[c3!.number, '40.00']]);
    expect(cls.placings.map((r: { number: number; place: number; totalShown: string; sheets: number }) => [r.number, r.place, r.totalShown, r.sheets])).toEqual([
      [c1!.number, 1, '27.00', 2],
      [c2!.number, 2, '26.50', 2],
    ]);
    expect((await a.client.get(`/api/events/${show.eventId}/results/review`)).status).toBe(403);
  });
});
