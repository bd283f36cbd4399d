import { expect } from 'vitest';
import { EventMembership } from '@server/models/event-membership';
import { ownerWithBuild, showWithClasses, signedIn, type Owner } from './event-factory';
import { SHEET, checkIn, scoreItem } from './judging-factory';

export type WalkUpCar = { title: string; entrantName: string; email?: string; customs?: boolean };

/**
 * A free show in judging with two classes and a car per owner (so each entrant has their own mailbox):
 * `cars` lists each class's cars by title. Two judges, Ada and Bo, score every class.
 */
export async function judgedShow(cars: { hotRods: string[]; customs: string[]; walkUps?: WalkUpCar[] }, rules?: Record<string, unknown>) {
  const show = await showWithClasses({ settings: { entryFee: 0 } });
  const { organiser, eventId, classIds } = show;
  expect((await organiser.client.put(`/api/events/${eventId}/criteria`, { criteria: SHEET })).status).toBe(200);
  if (rules) expect((await organiser.client.put(`/api/events/${eventId}/results/rules`, rules)).status).toBe(200);
  const entries: Array<{ id: number; number: number; classId: number; title: string; code: string; owner: Owner }> = [];
  for (const [i, titles] of [cars.hotRods, cars.customs].entries()) {
    for (const title of titles) {
      const owner = await ownerWithBuild(title);
      const res = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[i] });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      entries.push({ id: res.body.entry.id, number: res.body.entry.number, classId: classIds[i]!, title, code: owner.build.code, owner });
    }
  }
  const step = async (action: string) => expect((await organiser.client.post(`/api/events/${eventId}/lifecycle`, { action })).status).toBe(200);
  await step('close_registration');
  await step('open_gate');
  // Walk-ups are entered at the gate (checked in and paid there): no account, so no owner of their own.
  const walkUps: Array<{ id: number; number: number; title: string }> = [];
  for (const w of cars.walkUps ?? []) {
    const res = await organiser.client.post(`/api/events/${eventId}/gate/walk-ups`, { title: w.title, entrantName: w.entrantName, email: w.email, classId: classIds[w.customs ? 1 : 0] });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    walkUps.push({ id: res.body.card.entry.id, number: res.body.card.entry.number, title: w.title });
  }
  // Only cars that arrived are judged: every car is checked in before judging starts.
  for (const entry of entries) await checkIn(organiser.client, eventId, entry.number);
  await step('start_judging');
  const criteria = (await organiser.client.get(`/api/events/${eventId}`)).body.event.criteria as Array<{ id: number; name: string }>;
  const judges: Array<Awaited<ReturnType<typeof signedIn>>> = [];
  for (const name of ['Ada Marsh', 'Bo Lindqvist']) {
    const judge = await signedIn({ name });
    await EventMembership.create({ eventId, userId: judge.user.id, role: 'judge' });
    expect((await organiser.client.put(`/api/events/${eventId}/judges/${judge.user.id}/classes`, { allClasses: true })).status).toBe(200);
    judges.push(judge);
  }
  const car = (title: string) => entries.find((e) => e.title === title)!;
  /** One judge's whole sheet for a car, points in sheet order, with optional comments per line. */
  const score = async (judge: number, title: string, points: number[], comments: string[] = []) => {
    const id = entries.find((e) => e.title === title)?.id ?? walkUps.find((w) => w.title === title)!.id;
    const items = criteria.map((c, i) => scoreItem(id, c.id, points[i]!, new Date(), comments[i] ?? ''));
    const res = await judges[judge]!.client.post(`/api/events/${eventId}/scores`, { scores: items });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
  };
  return { ...show, entries, walkUps, criteria, judges, car, score, publish: (acknowledgeWarnings?: boolean) => organiser.client.post(`/api/events/${eventId}/lifecycle`, { action: 'publish_results', acknowledgeWarnings }) };
}
