import { expect } from 'vitest';
import { randomBytes, randomUUID, createHash } from 'node:crypto';
import { apiClient, type ApiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild, createFullBuild } from '../../support/build-factory';
import { ownerWithBuild, showWithClasses, signedIn } from '../../support/event-factory';
import { memberOf } from '../../support/show-day-factory';
import { checkIn, judgeOf, SHEET } from '../../support/judging-factory';
import { smallPng } from '../../support/images';
import { EventInvitation } from '@server/models/event-invitation';
import { ManualTieBreak } from '@server/models/manual-tie-break';
import { EventMembership } from '@server/models/event-membership';
import { Entry } from '@server/models/entry';
import { CardPrint } from '@server/models/card-print';
import { CaughtMail } from '@server/models/caught-mail';
import { receiveVisitorQuestion } from '@server/services/builds/build-questions';

/**
 * Every kind of caller the matrix asks as, in its columns' order. "Show A" is the show the routes are
 * asked about; "show B" is another show, fully staffed, so its people are real organisers, judges and gate staff.
 */
export const CALLERS = [
  'anonymous', // nobody signed in
  'unconfirmed', // signed up, has not followed the e-mail link
  'owner', // an owner with a build of their own, in no show
  'buildOwner', // the owner of the build and of the entry the route names
  'otherOwner', // another owner, with an entry of their own in show A
  'organiser', // organiser of show A
  'coOrganiser', // the second organiser of show A
  'otherOrganiser', // organiser of show B
  'judge', // judge of show A, of the entry's class
  'otherClassJudge', // judge of show A, of the other class
  'otherShowJudge', // judge of show B
  'gate', // gate staff of show A
  'otherGate', // gate staff of show B
  'siteAdmin',
  'disabled', // signed in, then turned off by the site admin
] as const;
export type Caller = (typeof CALLERS)[number];

type Show = { id: number; slug: string; classIds: number[]; entryIds: number[]; numbers: number[] };

async function step(organiser: ApiClient, eventId: number, ...actions: string[]) {
  for (const action of actions) {
    const res = await organiser.post(`/api/events/${eventId}/lifecycle`, { action });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
  }
}

async function enterBuild(client: ApiClient, eventId: number, buildId: number, classId: number) {
  const res = await client.post(`/api/events/${eventId}/entries`, { buildId, classId });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.entry as { id: number; number: number };
}

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

/**
 * One fixture for every cell: two shows being judged (so gate and judges are on duty), their people,
 * the builds and entries the routes name, and a spare of every record an allowed delete would take away
 * (one per organiser, since both organisers of show A are allowed).
 */
export async function buildFixture() {
  // ---- Show A: two classes, the sheet, three entries, all checked in, being judged.
  const a = await showWithClasses({ settings: { entryFee: 0, name: 'Matrix Show A' } });
  const organiser = a.organiser;
  expect((await organiser.client.put(`/api/events/${a.eventId}/criteria`, { criteria: SHEET })).status).toBe(200);
  const buildOwner = await signedIn({ name: 'Bea Buildowner' });
  const build = await createFullBuild(buildOwner.user.id, { title: 'Matrix coupe', published: true });
  const spareBuild = await createBuild(buildOwner.user.id, { title: 'Spare to delete', published: false });
  const entry = await enterBuild(buildOwner.client, a.eventId, build.id, a.classIds[0]!);
  const otherOwner = await ownerWithBuild('Other owner car');
  const otherEntry = await enterBuild(otherOwner.client, a.eventId, otherOwner.build.id, a.classIds[0]!);
  const secondBuild = await createBuild(otherOwner.user.id, { title: 'Other class car', published: true });
  const otherClassEntry = await enterBuild(otherOwner.client, a.eventId, secondBuild.id, a.classIds[1]!);
  const coOrganiser = await memberOf(a.eventId, 'organiser', 'Co Organiser');
  const judge = await judgeOf(a.eventId, 'Judge Classone');
  const otherClassJudge = await judgeOf(a.eventId, 'Judge Classtwo');
  const gate = await memberOf(a.eventId, 'gate', 'Gate Keeper');
  // Members an organiser may remove, one each, so both organisers' deletes find theirs.
  const spareMembers = { organiser: await createUser({ name: 'Spare Judge One' }), coOrganiser: await createUser({ name: 'Spare Judge Two' }) };
  for (const spare of Object.values(spareMembers)) await EventMembership.create({ eventId: a.eventId, userId: spare.user.id, role: 'judge' });
  const spareClasses: Record<'organiser' | 'coOrganiser', number> = { organiser: 0, coOrganiser: 0 };
  for (const who of ['organiser', 'coOrganiser'] as const) {
    const res = await organiser.client.post(`/api/events/${a.eventId}/classes`, { name: `Spare class ${who}`, capacity: null });
    expect(res.status).toBe(201);
    spareClasses[who] = res.body.class.id;
  }
  await step(organiser.client, a.eventId, 'close_registration', 'open_gate');
  for (const e of [entry, otherEntry, otherClassEntry]) await checkIn(organiser.client, a.eventId, e.number);
  await step(organiser.client, a.eventId, 'start_judging');
  // Checked in an hour ago, as on a real show morning: past the gate's minute to undo.
  await Entry.update({ checkedInAt: new Date(Date.now() - 3600_000) }, { where: { id: [entry.id, otherEntry.id, otherClassEntry.id] } });
  expect((await organiser.client.put(`/api/events/${a.eventId}/judges/${judge.user.id}/classes`, { allClasses: false, classIds: [a.classIds[0]] })).status).toBe(200);
  expect((await organiser.client.put(`/api/events/${a.eventId}/judges/${otherClassJudge.user.id}/classes`, { allClasses: false, classIds: [a.classIds[1]] })).status).toBe(200);

  // ---- Show B: the same shape, other people.
  const b = await showWithClasses({ settings: { entryFee: 0, name: 'Matrix Show B' }, classes: [{ name: 'B class' }] });
  expect((await b.organiser.client.put(`/api/events/${b.eventId}/criteria`, { criteria: SHEET })).status).toBe(200);
  const bOwner = await ownerWithBuild('Show B car');
  const bEntry = await enterBuild(bOwner.client, b.eventId, bOwner.build.id, b.classIds[0]!);
  const bSecond = await enterBuild(bOwner.client, b.eventId, (await createBuild(bOwner.user.id, { title: 'Show B second car', published: true })).id, b.classIds[0]!);
  const otherShowJudge = await judgeOf(b.eventId, 'Judge Othershow');
  const otherGate = await memberOf(b.eventId, 'gate', 'Gate Othershow');
  await step(b.organiser.client, b.eventId, 'close_registration', 'open_gate');
  for (const e of [bEntry, bSecond]) await checkIn(b.organiser.client, b.eventId, e.number);
  await step(b.organiser.client, b.eventId, 'start_judging');

  // ---- Show C takes entries (its organiser is nobody of the callers).
  const c = await showWithClasses({ settings: { entryFee: 0, name: 'Matrix Show C' }, classes: [{ name: 'C class' }] });

  // ---- People in no show.
  const owner = await ownerWithBuild('Unentered car');
  const unconfirmedUser = await createUser({ name: 'Una Confirmed', emailVerified: false });
  const unconfirmed = await apiClient();
  expect((await unconfirmed.signIn(unconfirmedUser.email, unconfirmedUser.password)).status).toBe(200);
  const adminUser = await createUser({ name: 'Site Admin', isSiteAdmin: true });
  const siteAdmin = await apiClient();
  expect((await siteAdmin.signIn(adminUser.email, adminUser.password)).status).toBe(200);
  const disabled = await signedIn({ name: 'Dee Sabled' });
  expect((await siteAdmin.put(`/api/admin/users/${disabled.user.id}/disabled`, { disabled: true })).status).toBe(200);
  // Its session ended with it: as the browser client does on a stale token, it fetches a new one (now signed out).
  await disabled.client.refresh();
  const spareAccount = await createUser({ name: 'Spare Account' });
  const caughtMail = await CaughtMail.create({ from: 'placard@example.test', to: spareAccount.email, subject: 'A caught mail', text: 'Only the site admin reads this.', html: null });

  // ---- Records the routes name: the build's log post, question, photo; the same of another build.
  const logPost = (await buildOwner.client.post(`/api/builds/${build.id}/log`, { postedOn: '2025-09-13', title: 'First fire-up', body: 'It ran.', status: 'published' })).body.post as { id: number };
  const questions = (await buildOwner.client.post(`/api/builds/${build.id}/questions`, { question: 'Is it drivable?', answer: 'Every weekend.' })).body.questions;
  const question = questions.answered[0] as { id: number };
  expect(await receiveVisitorQuestion(build.id, 'Is that the original paint?')).toBe(true);
  const waitingQuestion = (await buildOwner.client.get(`/api/builds/${build.id}/questions`)).body.questions.waiting[0] as { id: number };
  const foreignQuestion = (await owner.client.post(`/api/builds/${owner.build.id}/questions`, { question: 'Theirs?', answer: 'Yes.' })).body.questions.answered[0] as { id: number };
  const foreignLogPost = (await owner.client.post(`/api/builds/${owner.build.id}/log`, { postedOn: '2025-09-13', title: 'Not on my card', body: 'Another owner only.', status: 'published' })).body.post as { id: number };
  const upload = async (client: ApiClient, buildId: number) => {
    const res = await client.raw.post(`/api/builds/${buildId}/photos`).set('X-CSRF-Token', client.csrf).attach('photos', await smallPng(), 'car.png');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body.photos[0] as { id: number; src: string };
  };
  const photo = await upload(buildOwner.client, build.id);
  const foreignPhoto = await upload(owner.client, owner.build.id);
  const records = (await buildOwner.client.get(`/api/builds/${build.id}`)).body.build;
  const dynoRunId = records.dynoRuns[0].id as number;
  const weighInId = records.weighIns[0].id as number;
  const ownerRecords = await createFullBuild(owner.user.id, { title: 'Owner full build', published: false });
  const foreignDynoRunId = (await owner.client.get(`/api/builds/${ownerRecords.id}`)).body.build.dynoRuns[0].id as number;

  // ---- Show-side records: invitations, tie-breaks and a card print in each show.
  const invite = async (eventId: number, email: string) => {
    const token = randomBytes(24).toString('base64url');
    const inv = await EventInvitation.create({ eventId, email, role: 'judge', tokenHash: sha256(token), expiresAt: new Date(Date.now() + 7 * 86400_000), invitedBy: organiser.user.id });
    return { id: Number(inv.id), token };
  };
  const invitations = { organiser: await invite(a.eventId, 'spare-1@example.test'), coOrganiser: await invite(a.eventId, 'spare-2@example.test') };
  const ownerInvitation = await invite(a.eventId, owner.email);
  const strangerInvitation = await invite(a.eventId, 'nobody-here@example.test');
  const bInvitation = await invite(b.eventId, 'spare-b@example.test');
  const tieBreak = async (eventId: number, entryIds: number[]) =>
    (await ManualTieBreak.create({ eventId, entryIds, reason: 'Set by the matrix fixture', createdBy: organiser.user.id })).id as number;
  const tieBreaks = { organiser: await tieBreak(a.eventId, [entry.id, otherEntry.id]), coOrganiser: await tieBreak(a.eventId, [otherEntry.id, entry.id]) };
  const bTieBreak = await tieBreak(b.eventId, [bEntry.id, bSecond.id]);
  const print = await organiser.client.post(`/api/events/${a.eventId}/card-prints`, {});
  expect(print.status, JSON.stringify(print.body)).toBe(202);
  const bPrint = await b.organiser.client.post(`/api/events/${b.eventId}/card-prints`, {});
  expect(bPrint.status).toBe(202);
  // Held as running by a worker that is never stale, so a card worker another test file started in this
  // process neither takes these prints nor finishes them: every cell sees the same print, not yet ready.
  await CardPrint.update(
    { status: 'running', workerToken: randomUUID(), heldBy: 'authorization-matrix', heartbeatAt: new Date(Date.now() + 365 * 86400_000) },
    { where: { id: [print.body.print.id, bPrint.body.print.id] } },
  );

  const criteriaOf = async (client: ApiClient, eventId: number) => ((await client.get(`/api/events/${eventId}`)).body.event.criteria as Array<{ id: number }>).map((c) => c.id);
  const criteria = await criteriaOf(organiser.client, a.eventId);
  const bCriteria = await criteriaOf(b.organiser.client, b.eventId);

  const clients: Record<Caller, ApiClient> = {
    anonymous: await apiClient(),
    unconfirmed,
    owner: owner.client,
    buildOwner: buildOwner.client,
    otherOwner: otherOwner.client,
    organiser: organiser.client,
    coOrganiser: coOrganiser.client,
    otherOrganiser: b.organiser.client,
    judge: judge.client,
    otherClassJudge: otherClassJudge.client,
    otherShowJudge: otherShowJudge.client,
    gate: gate.client,
    otherGate: otherGate.client,
    siteAdmin,
    disabled: disabled.client,
  };
  const showA: Show = { id: a.eventId, slug: a.slug, classIds: a.classIds, entryIds: [Number(entry.id), Number(otherEntry.id), Number(otherClassEntry.id)], numbers: [entry.number, otherEntry.number, otherClassEntry.number] };
  const showC = { id: c.eventId, classIds: c.classIds };
  const showB: Show = { id: b.eventId, slug: b.slug, classIds: b.classIds, entryIds: [Number(bEntry.id)], numbers: [bEntry.number] };
  const users = {
    owner: Number(owner.user.id),
    buildOwner: Number(buildOwner.user.id),
    otherOwner: Number(otherOwner.user.id),
    organiser: Number(organiser.user.id),
    coOrganiser: Number(coOrganiser.user.id),
    otherOrganiser: Number(b.organiser.user.id),
    judge: Number(judge.user.id),
    otherClassJudge: Number(otherClassJudge.user.id),
    otherShowJudge: Number(otherShowJudge.user.id),
    gate: Number(gate.user.id),
    otherGate: Number(otherGate.user.id),
    unconfirmed: Number(unconfirmedUser.user.id),
    siteAdmin: Number(adminUser.user.id),
    disabled: Number(disabled.user.id),
    spareAccount: Number(spareAccount.user.id),
    bOwner: Number(bOwner.user.id),
    spareMember1: Number(spareMembers.organiser.user.id),
    spareMember2: Number(spareMembers.coOrganiser.user.id),
  };
  const emails = { owner: owner.email, spareAccount: spareAccount.email };
  /** The spare of an organiser's own; every other caller is refused before it matters, and is shown the first. */
  const spareOf = <T>(spares: Record<'organiser' | 'coOrganiser', T>, who: Caller) => (who === 'coOrganiser' ? spares.coOrganiser : spares.organiser);
  return {
    clients,
    users,
    emails,
    showA,
    showB,
    showC,
    build: { id: Number(build.id), code: String(build.code) },
    spareBuild: Number(spareBuild.id),
    ownerBuild: { id: Number(owner.build.id), code: String(owner.build.code) },
    bBuild: { id: Number(bOwner.build.id), code: String(bOwner.build.code) },
    entry: Number(entry.id),
    otherEntry: Number(otherEntry.id),
    otherClassEntry: Number(otherClassEntry.id),
    criteria,
    bCriteria,
    bEntry: Number(bEntry.id),
    logPost: Number(logPost.id),
    question: Number(question.id),
    waitingQuestion: Number(waitingQuestion.id),
    photo,
    dynoRunId,
    weighInId,
    foreign: { question: Number(foreignQuestion.id), logPost: Number(foreignLogPost.id), photo: Number(foreignPhoto.id), dynoRunId: foreignDynoRunId },
    spareClass: (who: Caller) => spareOf(spareClasses, who),
    spareMember: (who: Caller) => (who === 'coOrganiser' ? Number(spareMembers.coOrganiser.user.id) : Number(spareMembers.organiser.user.id)),
    invitation: (who: Caller) => spareOf(invitations, who),
    ownerInvitation,
    strangerInvitation,
    bInvitation,
    tieBreak: (who: Caller) => spareOf(tieBreaks, who),
    bTieBreak,
    caughtMail: Number(caughtMail.id),
    printId: Number(print.body.print.id) as number,
    bPrintId: Number(bPrint.body.print.id) as number,
  };
}
export type Fixture = Awaited<ReturnType<typeof buildFixture>>;
