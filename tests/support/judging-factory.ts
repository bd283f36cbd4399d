import { expect } from 'vitest';
import { randomUUID } from 'node:crypto';
import { hashPassword } from '@server/auth/passwords';
import { EventMembership } from '@server/models/event-membership';
import { User } from '@server/models/user';
import { apiClient } from './api-client';
import { DEFAULT_PASSWORD, uniqueEmail } from './factories';
import { createBuild } from './build-factory';
import { ownerWithBuild, showWithClasses, signedIn } from './event-factory';

export const SHEET = [
  { name: 'Paint and body', maxPoints: 10, weight: 2, tieBreakOrder: 1 },
  { name: 'Engine bay', maxPoints: 10, weight: 1.5, tieBreakOrder: 2 },
  { name: 'Interior', maxPoints: 5, weight: 1, tieBreakOrder: null },
];

/** A judge of the show, signed in, with a membership row as accepting an invitation would leave. */
export async function judgeOf(eventId: number, name = 'Jude Judgely') {
  const judge = await signedIn({ name });
  await EventMembership.create({ eventId, userId: judge.user.id, role: 'judge' });
  return judge;
}

// Many judges at once share one hash, made once at the test cost.
let cheapHash: Promise<string> | undefined;

/** A judge with one shared password hash, for tests that need dozens of them. */
export async function quickJudgeOf(eventId: number, name: string) {
  cheapHash ??= hashPassword(DEFAULT_PASSWORD);
  const user = await User.create({ email: uniqueEmail('judge'), name, passwordHash: await cheapHash, isSiteAdmin: false, mayOrganise: false });
  await EventMembership.create({ eventId, userId: user.id, role: 'judge' });
  const client = await apiClient();
  expect((await client.signIn(user.email, DEFAULT_PASSWORD)).status).toBe(200);
  return { client, user };
}

/**
 * A free show being judged: two classes, the three-line sheet above, `carsPerClass` confirmed
 * entries in each class (numbers in class order), and no judges yet. Every car is checked in at the
 * gate before judging starts (only cars that arrived are judged), except the last `notArrived` cars.
 */
export async function showInJudging(opts: { carsPerClass?: number; notArrived?: number } = {}) {
  const show = await showWithClasses({ settings: { entryFee: 0 } });
  const { organiser, eventId, classIds } = show;
  expect((await organiser.client.put(`/api/events/${eventId}/criteria`, { criteria: SHEET })).status).toBe(200);
  const owner = await ownerWithBuild('First car');
  const entries: Array<{ id: number; number: number; classId: number }> = [];
  for (const classId of classIds) {
    for (let i = 0; i < (opts.carsPerClass ?? 2); i++) {
      const build = entries.length === 0 ? owner.build : await createBuild(owner.user.id, { title: `Car ${entries.length + 1}`, published: true });
      const res = await owner.client.post(`/api/events/${eventId}/entries`, { buildId: build.id, classId });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      entries.push({ id: res.body.entry.id, number: res.body.entry.number, classId });
    }
  }
  const step = async (action: string) => {
    const res = await organiser.client.post(`/api/events/${eventId}/lifecycle`, { action });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
  };
  await step('close_registration');
  await step('open_gate');
  for (const entry of entries.slice(0, entries.length - (opts.notArrived ?? 0))) await checkIn(organiser.client, eventId, entry.number);
  await step('start_judging');
  const detail = (await organiser.client.get(`/api/events/${eventId}`)).body.event;
  const criteria = detail.criteria as Array<{ id: number; name: string; maxPoints: number }>;
  return { ...show, owner, entries, criteria };
}

/** The gate checks a car in by its number, as gate staff or an organiser would. */
export async function checkIn(client: Awaited<ReturnType<typeof apiClient>>, eventId: number, number: number) {
  const res = await client.post(`/api/events/${eventId}/gate/check-in`, { number, takeCash: false });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
}

export type ShowInJudging = Awaited<ReturnType<typeof showInJudging>>;

/** One score as a phone sends it. */
export const scoreItem = (entryId: number, criterionId: number, points: number, at: Date | string = new Date(), comment = '') => ({
  clientId: randomUUID(),
  deviceTime: typeof at === 'string' ? at : at.toISOString(),
  entryId,
  criterionId,
  points,
  comment,
});
