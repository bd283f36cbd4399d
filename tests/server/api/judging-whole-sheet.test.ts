import { describe, expect, it } from 'vitest';
import { sequelize } from '@server/db/sequelize';
import { Score } from '@server/models/score';
import { judgeOf, scoreItem, showInJudging } from '../../support/judging-factory';

// A sheet of several lines is written in one statement; each line must get the answer it would get
// sent alone (the single-line sends of judging.test.ts are the reference for each rule).
describe('a whole sheet in one send', () => {
  it('gives each line its own answer: new, replayed, replaced by another phone, older than stored', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    const car = show.entries[0]!;
    const [paint, engine, interior] = show.criteria.map((c) => c.id) as [number, number, number];
    const [phoneA, phoneB] = [crypto.randomUUID(), crypto.randomUUID()];
    const send = (deviceId: string, scores: object[]) => judge.client.post(`/api/events/${show.eventId}/scores`, { deviceId, scores });
    const stored = async () => (await Score.findAll({ where: { eventId: show.eventId }, order: [['criterionId', 'ASC']] })).map((s) => [s.criterionId, s.points]);

    const sheet = [{ ...scoreItem(car.id, paint, 5), sequence: 1 }, { ...scoreItem(car.id, engine, 6), sequence: 2 }, { ...scoreItem(car.id, interior, 3), sequence: 3 }];
    expect((await send(phoneA, sheet)).body.applied).toEqual(sheet.map((l) => ({ clientId: l.clientId, applied: true })));

    const fromB = { ...scoreItem(car.id, paint, 9), sequence: 1 };
    expect((await send(phoneB, [fromB])).body.applied).toEqual([{ clientId: fromB.clientId, applied: true }]);

    // Phone A's answer was lost and it sends the sheet again: nothing changes; paint was replaced by phone B.
    expect((await send(phoneA, sheet)).body.applied).toEqual([
      { clientId: sheet[0]!.clientId, applied: false, replacedByOtherDevice: true },
      { clientId: sheet[1]!.clientId, applied: false },
      { clientId: sheet[2]!.clientId, applied: false },
    ]);
    expect(await stored()).toEqual([[paint, 9], [engine, 6], [interior, 3]]);

    // A line older than the stored one (sequence 1 < 2) loses, a newer one wins; an id in capitals is answered as sent.
    const older = { ...scoreItem(car.id, engine, 1), sequence: 1 };
    const newer = { ...scoreItem(car.id, interior, 4), sequence: 4, clientId: crypto.randomUUID().toUpperCase() };
    expect((await send(phoneA, [older, newer])).body.applied).toEqual([
      { clientId: older.clientId, applied: false },
      { clientId: newer.clientId, applied: true },
    ]);
    expect(await stored()).toEqual([[paint, 9], [engine, 6], [interior, 4]]);

    // Two lines for one box in one send are taken in order, as separate sends would be.
    const twice = [{ ...scoreItem(car.id, engine, 7), sequence: 5 }, { ...scoreItem(car.id, engine, 8), sequence: 6 }];
    expect((await send(phoneA, twice)).body.applied.map((a: { applied: boolean }) => a.applied)).toEqual([true, true]);
    expect(await stored()).toEqual([[paint, 9], [engine, 8], [interior, 4]]);
  });

  it('costs the same statements for two cars’ sheets as for one', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const judge = await judgeOf(show.eventId);
    await show.organiser.client.put(`/api/events/${show.eventId}/judges/${judge.user.id}/classes`, { allClasses: true });
    const lines = (cars: typeof show.entries) => cars.flatMap((car) => show.criteria.map((c) => scoreItem(car.id, c.id, 2)));
    const statementsFor = async (scores: object[]) => {
      let n = 0;
      sequelize.addHook('afterQuery', 'count-sheet', () => void n++);
      try {
        expect((await judge.client.post(`/api/events/${show.eventId}/scores`, { scores })).status).toBe(200);
      } finally {
        sequelize.removeHook('afterQuery', 'count-sheet');
      }
      return n;
    };
    const one = await statementsFor(lines(show.entries.slice(0, 1)));
    const two = await statementsFor(lines(show.entries.slice(1, 3)));
    expect(two).toBe(one);
    expect(one).toBeLessThanOrEqual(10);
  });
});
