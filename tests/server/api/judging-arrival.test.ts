import { describe, expect, it } from 'vitest';
import type { JudgeView } from '@shared/schemas/judging';
import { checkIn, judgeOf, scoreItem, showInJudging } from '../../support/judging-factory';
import { memberOf } from '../../support/show-day-factory';
import { judgedShow } from '../../support/results-factory';

const numbersOf = (cars: Array<{ number: number }>) => cars.map((c) => c.number);

describe('only cars that arrived are judged', () => {
  it('lists a car not checked in as still expected, refuses its scores with the reason, and takes it once the gate checks it in during judging', async () => {
    const show = await showInJudging({ carsPerClass: 2, notArrived: 1 });
    const [first, , , late] = show.entries;
    const judge = await judgeOf(show.eventId);
    expect((await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true })).status).toBe(200);
    const view = async () => (await judge.client.get(`/api/events/${show.eventId}/judging/mine`)).body as JudgeView;

    const before = await view();
    expect(numbersOf(before.cars)).toEqual([1, 2, 3]);
    expect(before.expected).toEqual([{ entryId: late!.id, number: 4, className: 'Customs', title: 'Car 4' }]);

    // A whole send is refused when it holds a car that has not arrived: nothing of it is recorded.
    const refused = await judge.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(first!.id, show.criteria[0]!.id, 7), scoreItem(late!.id, show.criteria[0]!.id, 9)] });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toBe('No. 4 has not arrived: only cars the gate has checked in are judged. Nothing in this send was recorded.');
    expect((await view()).scores).toEqual([]);

    // The car turns up after judging started: gate staff check it in and it joins the judge's list.
    const gate = await memberOf(show.eventId, 'gate');
    await checkIn(gate.client, show.eventId, 4);
    const after = await view();
    expect(numbersOf(after.cars)).toEqual([1, 2, 3, 4]);
    expect(after.expected).toEqual([]);
    expect((await judge.client.post(`/api/events/${show.eventId}/scores`, { scores: [scoreItem(late!.id, show.criteria[0]!.id, 9)] })).status).toBe(200);
  });

  it('counts only arrived cars in the organiser’s progress', async () => {
    const show = await showInJudging({ carsPerClass: 2, notArrived: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    const progress = (await show.organiser.client.get(`/api/events/${show.eventId}/judging/progress`)).body.progress;
    expect(progress.byJudge[0].cars).toBe(3);
    expect(progress.byJudge[0].leftNumbers).toEqual([1, 2, 3]);
  });
});

describe('results and publishing follow arrival', () => {
  it('ranks only arrived cars, and publishing warns of a scored car that never arrived and a car with no finished sheet until the organiser says to publish anyway', async () => {
    const show = await judgedShow({ hotRods: ['Roadster', 'Coupe', 'Gasser'], customs: ['Lead sled'] });
    const { organiser, eventId } = show;
    await show.score(0, 'Roadster', [8, 8, 4]);
    await show.score(0, 'Lead sled', [7, 7, 3]);
    // The best sheet goes to the gasser, then the gate finds it was checked in by mistake and undoes it.
    await show.score(0, 'Gasser', [10, 10, 5]);
    const undo = await organiser.client.post(`/api/events/${eventId}/gate/undo`, { entryId: show.car('Gasser').id });
    expect(undo.status, JSON.stringify(undo.body)).toBe(200);

    const review = (await organiser.client.get(`/api/events/${eventId}/results/review`)).body;
    // The gasser's sheet is the best of all, yet best of show and every class place go to arrived cars.
    const placed = (lines: Array<{ title: string }>) => lines.map((p) => p.title);
    expect(placed(review.review.bestOfShow)).toEqual(['Roadster']);
    expect(review.review.classes.flatMap((c: { placings: Array<{ title: string }> }) => placed(c.placings))).toEqual(['Lead sled']);
    expect(review.warnings).toEqual([
      { kind: 'scored_not_arrived', cars: [{ entryId: show.car('Gasser').id, number: show.car('Gasser').number, title: 'Gasser', className: 'Hot rods' }] },
      { kind: 'no_finished_sheet', cars: [{ entryId: show.car('Coupe').id, number: show.car('Coupe').number, title: 'Coupe', className: 'Hot rods' }] },
    ]);

    const unacknowledged = await show.publish();
    expect(unacknowledged.status).toBe(409);
    expect(unacknowledged.body.error.fields.acknowledgeWarnings).toContain(`No. ${show.car('Gasser').number}`);
    expect((await organiser.client.get(`/api/events/${eventId}`)).body.event.status).toBe('judging');

    expect((await show.publish(true)).status).toBe(200);
    const published = (await organiser.client.get(`/api/public/events/${(await organiser.client.get(`/api/events/${eventId}`)).body.event.slug}`)).body;
    const publicResults = JSON.stringify(published.event.results);
    expect(publicResults).toContain('Roadster');
    expect(publicResults).not.toContain('Gasser');
  });

  it('publishes with no acknowledgement when every arrived car has a finished sheet and no absent car was scored', async () => {
    const show = await judgedShow({ hotRods: ['Roadster'], customs: ['Lead sled'] });
    await show.score(0, 'Roadster', [8, 8, 4]);
    await show.score(0, 'Lead sled', [7, 7, 3]);
    expect((await show.organiser.client.get(`/api/events/${show.eventId}/results/review`)).body.warnings).toEqual([]);
    expect((await show.publish()).status).toBe(200);
  });
});
