import { expect } from 'vitest';
import { randomBytes, randomUUID } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { EventMembership } from '@server/models/event-membership';
import { BuildLogPost } from '@server/models/build-log-post';
import { BuildQuestion } from '@server/models/build-question';
import { DynoRun } from '@server/models/dyno-run';
import { WeighIn } from '@server/models/weigh-in';
import { Criterion } from '@server/models/criterion';
import { createUser, DEFAULT_PASSWORD, uniqueEmail } from './factories';
import { createBuild, createFullBuild } from './build-factory';
import { showWithClasses } from './event-factory';
import { SHEET } from './judging-factory';
import { apiClient } from './api-client';
import { caller, type Caller } from './hostile-client';

// One small world for the hostile-input tests: a build with its records, a show with classes, a
// sheet, an entry, an invitation, and a person of each kind, each signed in on the raw client.
// Everything it holds is found again by its ids, so the checksum reads only this world's rows
// while other test files write beside it.

export const CALLERS = ['owner', 'organiser', 'judge', 'gate', 'admin', 'other'] as const;
export type CallerName = (typeof CALLERS)[number] | 'anonymous';

/** How far the world's show has gone: taking entries, or being judged (its car checked in at the gate). */
export type Stage = 'registration' | 'judging';

export async function createWorld(baseUrl: string, stage: Stage = 'registration') {
  const tag = randomUUID().slice(0, 8);
  const show = await showWithClasses({ settings: { entryFee: 0 } });
  const { eventId, classIds } = show;
  expect((await show.organiser.client.put(`/api/events/${eventId}/criteria`, { criteria: SHEET })).status).toBe(200);
  const person = async (flags: Parameters<typeof createUser>[0]) => {
    const { user, email } = await createUser(flags);
    return { id: user.id, email };
  };
  const people: Record<(typeof CALLERS)[number], { id: number; email: string }> = {
    organiser: { id: show.organiser.user.id, email: show.organiser.email },
    owner: await person({ name: 'Owen Hostile' }),
    judge: await person({ name: 'Jude Hostile' }),
    gate: await person({ name: 'Gale Hostile' }),
    admin: await person({ name: 'Ada Hostile', isSiteAdmin: true }),
    other: await person({ name: 'Otto Hostile' }),
  };
  await EventMembership.create({ eventId, userId: people.judge.id, role: 'judge' });
  await EventMembership.create({ eventId, userId: people.gate.id, role: 'gate' });

  const build = await createFullBuild(people.owner.id, { published: true, title: 'Hostile test coupe' });
  const spare = await createBuild(people.owner.id, { title: 'Spare for deleting' });
  const ownerApi = await apiClient();
  expect((await ownerApi.signIn(people.owner.email, DEFAULT_PASSWORD)).status).toBe(200);
  const entered = await ownerApi.post(`/api/events/${eventId}/entries`, { buildId: build.id, classId: classIds[0] });
  expect(entered.status, JSON.stringify(entered.body)).toBe(201);
  const invited = await show.organiser.client.post(`/api/events/${eventId}/invitations`, { email: uniqueEmail('invitee'), role: 'judge' });
  expect(invited.status, JSON.stringify(invited.body)).toBe(201);

  if (stage === 'judging') {
    const organiser = show.organiser.client;
    const step = async (action: string) => expect((await organiser.post(`/api/events/${eventId}/lifecycle`, { action })).status).toBe(200);
    await step('close_registration');
    await step('open_gate');
    expect((await organiser.post(`/api/events/${eventId}/gate/check-in`, { number: entered.body.entry.number, takeCash: false })).status).toBe(200);
    await step('start_judging');
  }
  const criterion = await Criterion.findOne({ where: { eventId } });
  const dynoRun = await DynoRun.findOne({ where: { buildId: build.id } });
  const weighIn = await WeighIn.findOne({ where: { buildId: build.id } });
  const post = await BuildLogPost.create({ buildId: build.id, postedOn: '2026-03-02', title: 'First start', body: 'It ran.', status: 'draft', photoIds: [], dynoRunId: null, weighInId: null });
  const answered = await BuildQuestion.create({ buildId: build.id, question: 'What paint?', answer: 'Green.', answeredAt: new Date() });
  const waiting = await BuildQuestion.create({ buildId: build.id, question: 'How fast?', answer: null, answeredAt: null, fromVisitor: true });

  const callers = {} as Record<CallerName, Caller>;
  callers.anonymous = await caller(baseUrl, 'anonymous');
  for (const name of CALLERS) callers[name] = await caller(baseUrl, name, { email: people[name].email, password: DEFAULT_PASSWORD });

  const userIds = Object.values(people).map((p) => p.id);
  return {
    tag,
    callers,
    people,
    ids: {
      eventId,
      classId: classIds[0]!,
      otherClassId: classIds[1]!,
      buildId: Number(build.id),
      buildCode: String(build.code),
      /** A second build of the owner's, for the routes that delete one (in the throwaway world they really do). */
      spareBuildId: Number(spare.id),
      entryId: entered.body.entry.id as number,
      criterionId: Number(criterion!.id),
      invitationId: invited.body.invitation.id as number,
      dynoRunId: Number(dynoRun!.id),
      weighInId: Number(weighIn!.id),
      postId: Number(post.id),
      questionId: Number(waiting.id),
      answeredId: Number(answered.id),
      judgeId: people.judge.id,
      otherUserId: people.other.id,
      /** A well-formed id no row has: routes whose rows cost more to make than the test is worth (photos, tie-breaks). */
      nothing: 2_147_480_000,
      /** A well-formed invitation token that opens nothing. */
      token: randomBytes(24).toString('base64url'),
    },
    /** A fingerprint of every row of this world (and of accounts whose e-mail carries its tag): equal before and after a refused request. */
    checksum: () => worldChecksum({ users: userIds, events: [eventId], tag }),
  };
}
export type World = Awaited<ReturnType<typeof createWorld>>;

/** The columns that tie a row to a person, a build or a show. */
const USER_COLUMNS = ['user_id', 'owner_id', 'judge_id', 'actor_id', 'created_by', 'started_by', 'invited_by', 'accepted_by', 'published_by', 'voided_by'];
/** Tables whose rows change on every request (sessions, rate-limit counters) or belong to nobody in particular. */
const SKIPPED = new Set(['session', 'rate_limit_hits', 'schema_migrations', 'caught_mails', 'seed_runs', 'retired_build_codes', 'mail_dedupe_keys', 'payment_events', 'score_receipts']);

let tableColumns: Promise<Map<string, string[]>> | undefined;
const columnsByTable = () =>
  (tableColumns ??= sequelize
    .query<{ table_name: string; column_name: string }>("SELECT table_name, column_name FROM information_schema.columns WHERE table_schema = 'public'", { type: QueryTypes.SELECT })
    .then((rows) => {
      const map = new Map<string, string[]>();
      for (const r of rows) map.set(r.table_name, [...(map.get(r.table_name) ?? []), r.column_name]);
      return map;
    }));

/**
 * Row count and md5 of each table's rows that belong to these people, their builds and these shows
 * (a new build or show of theirs included), and of accounts whose e-mail carries the tag.
 */
export async function worldChecksum(world: { users: number[]; events: number[]; tag: string }): Promise<Record<string, string>> {
  const tables = await columnsByTable();
  const parts: string[] = [];
  for (const [table, columns] of [...tables].sort(([a], [b]) => a.localeCompare(b))) {
    if (SKIPPED.has(table)) continue;
    const ors: string[] = [];
    const myUsers = `(SELECT id FROM users WHERE id = ANY($users) OR email LIKE $tag)`;
    const myBuilds = `(SELECT id FROM builds WHERE owner_id IN ${myUsers})`;
    const myEvents = `(SELECT id FROM events WHERE id = ANY($events) OR created_by IN ${myUsers})`;
    if (table === 'users') ors.push(`id IN ${myUsers}`);
    if (table === 'builds') ors.push(`id IN ${myBuilds}`);
    if (table === 'events') ors.push(`id IN ${myEvents}`);
    for (const c of columns) {
      if (USER_COLUMNS.includes(c)) ors.push(`${c} IN ${myUsers}`);
      if (c === 'build_id') ors.push(`build_id IN ${myBuilds}`);
      if (c === 'event_id') ors.push(`event_id IN ${myEvents}`);
    }
    if (!ors.length) continue;
    parts.push(`SELECT '${table}' AS t, count(*)::text || ':' || coalesce(md5(string_agg(x::text, '|' ORDER BY x::text)), '') AS sum FROM "${table}" x WHERE ${ors.join(' OR ')}`);
  }
  const rows = await sequelize.query<{ t: string; sum: string }>(parts.join(' UNION ALL '), {
    type: QueryTypes.SELECT,
    bind: { users: world.users, events: world.events, tag: `%${world.tag}%` },
  });
  return Object.fromEntries(rows.map((r) => [r.t, r.sum]));
}
