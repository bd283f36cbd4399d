import { randomUUID } from 'node:crypto';
import { SHEET } from '../../support/judging-factory';
import { showSettings } from '../../support/event-factory';
import type { ForeignCell, Row } from './matrix';

const A = (f: { showA: { id: number } }, rest = '') => `/api/events/${f.showA.id}${rest}`;
const E = (f: { entry: number }, rest = '') => `/api/entries/${f.entry}${rest}`;

/** Show A (being judged) and its entries: running the show, its people, entering, the entry table and the gate. */
export const SHOW_ROWS: Row[] = [
  { route: 'GET /api/events', rule: 'signedIn', ok: 200, note: "each caller's own shows" },
  { route: 'GET /api/events/open', rule: 'signedIn', ok: 200 },
  { route: 'POST /api/events', rule: 'mayOrganise', ok: 201, body: () => showSettings({ name: 'Another matrix show' }) },
  { route: 'GET /api/events/:id', rule: 'showView', ok: 200 },
  { route: 'PATCH /api/events/:id', rule: 'showManage', ok: 200, body: () => ({ description: 'Still an invented test show.' }) },
  { route: 'POST /api/events/:id/lifecycle', rule: 'showManage', ok: 409, body: () => ({ action: 'open_registration' }), note: 'a step the show being judged cannot take: refused after the policy' },
  { route: 'POST /api/events/:id/classes', rule: 'showManage', ok: 201, body: (_f, who) => ({ name: `Added by ${who}` }) },
  { route: 'PATCH /api/events/:id/classes/:classId', rule: 'showManage', ok: 200, path: (f) => A(f, `/classes/${f.showA.classIds[0]}`), body: () => ({ description: 'Hot rods of any year.' }) },
  { route: 'DELETE /api/events/:id/classes/:classId', rule: 'showManage', ok: 204, path: (f, who) => A(f, `/classes/${f.spareClass(who)}`) },
  { route: 'PUT /api/events/:id/criteria', rule: 'showManage', ok: 409, body: () => ({ criteria: SHEET }), note: 'the sheet is fixed once judging starts' },
  { route: 'GET /api/events/:id/audit', rule: 'showManage', ok: 200 },
  { route: 'POST /api/events/:id/logo', rule: 'showManage', ok: 400, note: 'no file sent: refused after the policy' },
  { route: 'DELETE /api/events/:id/logo', rule: 'showManage', ok: 200, note: 'answers the show as it is now' },
  { route: 'GET /api/events/:id/people', rule: 'showManage', ok: 200 },
  { route: 'POST /api/events/:id/invitations', rule: 'showManage', ok: 201, body: (_f, who) => ({ email: `invitee-${who}-${randomUUID().slice(0, 8)}@example.test`, role: 'gate' }) },
  { route: 'DELETE /api/events/:id/invitations/:invitationId', rule: 'showManage', ok: 204, path: (f, who) => A(f, `/invitations/${f.invitation(who).id}`) },
  { route: 'DELETE /api/events/:id/members/:userId/:role', rule: 'showManage', ok: 204, path: (f, who) => A(f, `/members/${f.spareMember(who)}/judge`) },
  { route: 'GET /api/invitations/:token', rule: 'public', ok: 200, path: (f) => `/api/invitations/${f.ownerInvitation.token}` },
  // Sent to the owner's address: the owner alone may take it; everyone else confirmed is refused by the invitation itself.
  {
    route: 'POST /api/invitations/:token/accept',
    rule: 'confirmed',
    ok: { owner: 200, else: 403 },
    path: (f, who) => `/api/invitations/${(who === 'owner' ? f.ownerInvitation : f.strangerInvitation).token}/accept`,
    last: true,
    note: "the owner takes the invitation sent to the owner's address; everyone else is refused one sent to an address not theirs",
  },
  { route: 'POST /api/events/:id/entries', rule: 'confirmed', ok: 409, body: (f) => ({ buildId: f.ownerBuild.id, classId: f.showA.classIds[0] }), note: 'entries are closed: every confirmed person reaches the rule that says so' },
  { route: 'GET /api/events/:id/entries', rule: 'showManage', ok: 200 },
  { route: 'GET /api/entries', rule: 'signedIn', ok: 200, note: "each caller's own entries" },
  { route: 'POST /api/entries/:id/withdraw', rule: 'entryOwnerOrOrganiser', ok: { buildOwner: 200, else: 409 }, last: true, note: 'the owner withdraws it; the organisers then find it withdrawn' },
  { route: 'POST /api/entries/:id/accept-offer', rule: 'entryOwner', ok: 409, note: 'no offer to accept' },
  { route: 'POST /api/entries/:id/checkout', rule: 'entryOwner', ok: 409, note: 'a free show: nothing to pay' },
  { route: 'GET /api/events/:id/entry-table', rule: 'showManage', ok: 200 },
  { route: 'GET /api/events/:id/money', rule: 'showManage', ok: 200 },
  { route: 'GET /api/events/:id/entries.csv', rule: 'showManage', ok: 200 },
  { route: 'POST /api/entries/:id/class', rule: 'entryOrganiser', ok: 200, body: (f, who) => ({ classId: f.showA.classIds[who === 'coOrganiser' ? 0 : 1] }), note: 'the organiser moves it to the other class, the co-organiser back' },
  { route: 'POST /api/entries/:id/mark-paid', rule: 'entryOrganiser', ok: 409, body: () => ({ note: 'Cash at the gate' }), note: 'a free show: nothing to mark paid' },
  { route: 'POST /api/entries/:id/move-up', rule: 'entryOrganiser', ok: 409, note: 'not on the waiting list' },
  { route: 'GET /api/entries/:id/audit', rule: 'entryOrganiser', ok: 200 },
  { route: 'GET /api/events/:id/gate/lookup', rule: 'showCheckIn', ok: 200, path: (f) => A(f, `/gate/lookup?number=${f.showA.numbers[0]}`) },
  { route: 'POST /api/events/:id/gate/check-in', rule: 'showCheckIn', ok: 409, body: (f) => ({ number: f.showA.numbers[0], takeCash: false }), note: 'already checked in' },
  { route: 'POST /api/events/:id/gate/undo', rule: 'showCheckIn', ok: 409, body: (f) => ({ entryId: f.entry }), note: 'checked in an hour ago (the fixture): too late to undo at the gate' },
  { route: 'GET /api/events/:id/gate/counts', rule: 'showCheckIn', ok: 200 },
  { route: 'GET /api/events/:id/gate/roster', rule: 'showCheckIn', ok: 200 },
  {
    route: 'POST /api/events/:id/gate/sync',
    rule: 'showCheckIn',
    ok: 200,
    body: (f) => ({ deviceId: randomUUID(), checkIns: [{ clientId: randomUUID(), sequence: 1, number: f.showA.numbers[1], takeCash: false, at: new Date().toISOString() }] }),
  },
  { route: 'POST /api/events/:id/gate/walk-ups', rule: 'showCheckIn', ok: 201, body: (f, who) => ({ title: `Walk-up of ${who}`, entrantName: 'Wanda Walker', classId: f.showA.classIds[1] }) },
  { route: 'GET /api/events/:id/gate/cards/:number', rule: 'showCheckIn', ok: 200, path: (f) => A(f, `/gate/cards/${f.showA.numbers[0]}`) },
];

/** Organisers and gate staff of show A, with show B's ids in the path, body or list. */
export const SHOW_FOREIGN: ForeignCell[] = [
  { route: 'PATCH /api/events/:id/classes/:classId', as: 'organiser', why: "show B's class under show A", status: 404, path: (f) => A(f, `/classes/${f.showB.classIds[0]}`), body: () => ({ name: 'Taken over' }) },
  { route: 'DELETE /api/events/:id/classes/:classId', as: 'organiser', why: "show B's class under show A", status: 404, path: (f) => A(f, `/classes/${f.showB.classIds[0]}`) },
  { route: 'DELETE /api/events/:id/invitations/:invitationId', as: 'organiser', why: "show B's invitation under show A", status: 404, path: (f) => A(f, `/invitations/${f.bInvitation.id}`) },
  { route: 'DELETE /api/events/:id/members/:userId/:role', as: 'organiser', why: "show B's organiser under show A", status: 404, path: (f) => A(f, `/members/${f.users.otherOrganiser}/organiser`) },
  {
    route: 'GET /api/events/:id/audit',
    as: 'organiser',
    why: "show B's entry in the query",
    status: 200,
    path: (f) => A(f, `/audit?entryId=${f.bEntry}`),
    check: (body) => {
      if ((body as { audit: unknown[] }).audit.length) throw new Error(`show B's audit lines: ${JSON.stringify(body)}`);
    },
  },
  { route: 'POST /api/entries/:id/class', as: 'organiser', why: "show B's class in the body", status: 400, path: (f) => E(f, '/class'), body: (f) => ({ classId: f.showB.classIds[0] }) },
  { route: 'POST /api/entries/:id/withdraw', as: 'organiser', why: "show B's entry in the path", status: 404, path: (f) => `/api/entries/${f.bEntry}/withdraw` },
  { route: 'POST /api/entries/:id/mark-paid', as: 'organiser', why: "show B's entry in the path", status: 404, path: (f) => `/api/entries/${f.bEntry}/mark-paid`, body: () => ({ note: 'Cash' }) },
  { route: 'GET /api/entries/:id/card.pdf', as: 'organiser', why: "show B's entry in the path", status: 404, path: (f) => `/api/entries/${f.bEntry}/card.pdf` },
  { route: 'POST /api/events/:id/gate/undo', as: 'gate', why: "show B's entry in the body", status: 404, path: (f) => A(f, '/gate/undo'), body: (f) => ({ entryId: f.bEntry }) },
  { route: 'POST /api/events/:id/gate/walk-ups', as: 'gate', why: "show B's class in the body", status: 400, path: (f) => A(f, '/gate/walk-ups'), body: (f) => ({ title: 'Sneaky', entrantName: 'Sam', classId: f.showB.classIds[0] }) },
  {
    route: 'GET /api/events/:id/gate/lookup',
    as: 'gate',
    why: "show B's car's code in the query",
    status: 200,
    path: (f) => A(f, `/gate/lookup?code=${f.bBuild.code}`),
    check: (body) => {
      const { card } = body as { card: { entry: unknown; problem: string } };
      if (card.entry !== null || card.problem !== 'other_show') throw new Error(`named show B's entry: ${JSON.stringify(card)}`);
    },
  },
  // Show C takes entries: there the rules about the build and the class are reached.
  // Answered as a missing build (400 naming buildId), so build ids cannot be probed this way (it was a 403 saying whose).
  {
    route: 'POST /api/events/:id/entries',
    as: 'owner',
    why: "another owner's build in the body",
    status: 400,
    path: (f) => `/api/events/${f.showC.id}/entries`,
    body: (f) => ({ buildId: f.build.id, classId: f.showC.classIds[0] }),
    check: (body) => {
      if ((body as { error: { fields: Record<string, string> } }).error.fields.buildId !== 'No such build.') throw new Error(`not answered as a missing build: ${JSON.stringify(body)}`);
    },
  },
  { route: 'POST /api/events/:id/entries', as: 'owner', why: "show B's class in the body", status: 400, path: (f) => `/api/events/${f.showC.id}/entries`, body: (f) => ({ buildId: f.ownerBuild.id, classId: f.showB.classIds[0] }) },
];
