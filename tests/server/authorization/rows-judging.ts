import { randomUUID } from 'node:crypto';
import type { ForeignCell, Row } from './matrix';
import type { Fixture } from './fixture';

const A = (f: { showA: { id: number } }, rest = '') => `/api/events/${f.showA.id}${rest}`;
const score = (entryId: number, criterionId: number, points = 5) => ({ clientId: randomUUID(), deviceTime: new Date().toISOString(), entryId, criterionId, points, comment: '' });
const HASH = 'a'.repeat(64);

/** Show A's judging, numbered cards, people's choice and results. */
export const JUDGING_ROWS: Row[] = [
  { route: 'GET /api/judging', rule: 'signedIn', ok: 200, note: "each caller's own shows to judge" },
  { route: 'GET /api/events/:id/judging/mine', rule: 'showJudge', ok: 200 },
  { route: 'POST /api/events/:id/scores', rule: 'showJudgeOfClass', ok: 200, body: (f: Fixture) => ({ scores: [score(f.entry, f.criteria[0]!)] }) },
  { route: 'GET /api/events/:id/judges', rule: 'showManage', ok: 200 },
  { route: 'PUT /api/events/:id/judges/:judgeId/classes', rule: 'showManage', ok: 200, path: (f) => A(f, `/judges/${f.users.judge}/classes`), body: (f) => ({ allClasses: false, classIds: [f.showA.classIds[0]] }) },
  { route: 'GET /api/events/:id/judging/progress', rule: 'showManage', ok: 200 },
  { route: 'GET /api/events/:id/results/review', rule: 'showManage', ok: 200 },
  { route: 'POST /api/events/:id/card-prints', rule: 'showManage', ok: 200, body: () => ({}), note: 'the fixture started one already: answered with that print' },
  { route: 'GET /api/events/:id/card-prints/latest', rule: 'showManage', ok: 200 },
  { route: 'GET /api/events/:id/card-prints/:printId', rule: 'showManage', ok: 200, path: (f) => A(f, `/card-prints/${f.printId}`) },
  { route: 'GET /api/events/:id/card-prints/:printId/cards.pdf', rule: 'showManage', ok: 409, path: (f) => A(f, `/card-prints/${f.printId}/cards.pdf`), note: 'the fixture holds the print as running: the file is not ready' },
  { route: 'POST /api/events/:id/reminders', rule: 'showManage', ok: 409, note: 'reminders go before the show day, not while it is judged' },
  { route: 'GET /api/entries/:id/card.pdf', rule: 'entryOwnerOrOrganiser', ok: 200 },
  { route: 'GET /api/events/:id/peoples-choice', rule: 'showManage', ok: 200 },
  { route: 'POST /api/events/:id/peoples-choice/open', rule: 'showManage', ok: 200 },
  { route: 'POST /api/events/:id/peoples-choice/close', rule: 'showManage', ok: 200 },
  { route: 'POST /api/events/:id/peoples-choice/void', rule: 'showManage', ok: 200, body: () => ({ addressHash: HASH }) },
  { route: 'POST /api/events/:id/peoples-choice/void-burst', rule: 'showManage', ok: 200, body: () => ({ addressHash: HASH, from: new Date(Date.now() - 60_000).toISOString(), to: new Date().toISOString() }) },
  { route: 'GET /api/events/:id/results/rules', rule: 'showManage', ok: 200 },
  { route: 'PUT /api/events/:id/results/rules', rule: 'showManage', ok: 200, body: () => ({ trimFromSheets: null, placesPerClass: 3, bestOfShow: true, bestOfShowKeepsClassPlace: false, shareCommentsWithEntrants: true, printPaper: 'letter' }) },
  { route: 'POST /api/events/:id/results/tie-breaks', rule: 'showManage', ok: 400, body: (f) => ({ entryIds: [f.entry, f.otherEntry], reason: 'Cleaner underside' }), note: 'these two cars are not tied: a hand order only breaks a tie the review shows' },
  { route: 'DELETE /api/events/:id/results/tie-breaks/:tieBreakId', rule: 'showManage', ok: 204, path: (f, who) => A(f, `/results/tie-breaks/${f.tieBreak(who)}`) },
  { route: 'GET /api/events/:id/results/awards', rule: 'showManage', ok: 409, note: 'nothing published yet' },
  { route: 'GET /api/events/:id/results/read-out', rule: 'showManage', ok: 409, note: 'nothing published yet' },
  { route: 'GET /api/events/:id/results/scores.csv', rule: 'showManage', ok: 200 },
  { route: 'GET /api/events/:id/results/sheet.pdf', rule: 'showManage', ok: 409, note: 'nothing published yet' },
  { route: 'GET /api/events/:id/results/certificates.pdf', rule: 'showManage', ok: 409, note: 'nothing published yet' },
  { route: 'GET /api/entries/:id/results', rule: 'entryOwnerOrOrganiser', ok: 409, note: 'nothing published yet' },
  // Closing and reopening change the show: at the end, after every other row (both are answered 200 twice).
  { route: 'POST /api/events/:id/judging/close', rule: 'showManage', ok: 200, last: true },
  { route: 'POST /api/events/:id/judging/reopen', rule: 'showManage', ok: 200, last: true },
];

/** Judges and organisers of show A with show B's ids (and an entry of a class they do not judge) inside bodies and lists. */
export const JUDGING_FOREIGN: ForeignCell[] = [
  {
    route: 'POST /api/events/:id/scores',
    as: 'judge',
    why: "a list of scores with one for show B's car",
    status: 400,
    path: (f) => A(f, '/scores'),
    body: (f) => ({ scores: [score(f.entry, f.criteria[0]!), score(f.bEntry, f.criteria[0]!)] }),
  },
  {
    route: 'POST /api/events/:id/scores',
    as: 'judge',
    why: "a list of scores with one on show B's sheet line",
    status: 400,
    path: (f) => A(f, '/scores'),
    body: (f) => ({ scores: [score(f.entry, f.criteria[0]!), score(f.entry, f.bCriteria[0]!)] }),
  },
  {
    route: 'POST /api/events/:id/scores',
    as: 'judge',
    why: 'a list of scores with one for a car of the class this judge does not judge',
    status: 403,
    path: (f) => A(f, '/scores'),
    body: (f) => ({ scores: [score(f.entry, f.criteria[0]!), score(f.otherClassEntry, f.criteria[0]!)] }),
  },
  { route: 'POST /api/events/:id/scores', as: 'otherShowJudge', why: "show B's judge scoring show B's car through show A", status: 404, path: (f) => A(f, '/scores'), body: (f) => ({ scores: [score(f.bEntry, f.bCriteria[0]!)] }) },
  { route: 'PUT /api/events/:id/judges/:judgeId/classes', as: 'organiser', why: "show B's judge under show A", status: 400, path: (f) => A(f, `/judges/${f.users.otherShowJudge}/classes`), body: () => ({ allClasses: true }) },
  { route: 'PUT /api/events/:id/judges/:judgeId/classes', as: 'organiser', why: "a list of classes with show B's class", status: 400, path: (f) => A(f, `/judges/${f.users.judge}/classes`), body: (f) => ({ allClasses: false, classIds: [f.showA.classIds[0], f.showB.classIds[0]] }) },
  { route: 'POST /api/events/:id/card-prints', as: 'organiser', why: "show B's class in the body", status: 400, path: (f) => A(f, '/card-prints'), body: (f) => ({ classId: f.showB.classIds[0] }) },
  {
    route: 'GET /api/events/:id/card-prints/latest',
    as: 'organiser',
    why: "show B's class in the query",
    status: 200,
    path: (f) => A(f, `/card-prints/latest?classId=${f.showB.classIds[0]}`),
    check: (body) => {
      if ((body as { print: unknown }).print !== null) throw new Error(`a print of show B: ${JSON.stringify(body)}`);
    },
  },
  { route: 'GET /api/events/:id/card-prints/:printId', as: 'organiser', why: "show B's print under show A", status: 404, path: (f) => A(f, `/card-prints/${f.bPrintId}`) },
  { route: 'GET /api/events/:id/card-prints/:printId/cards.pdf', as: 'organiser', why: "show B's print under show A", status: 404, path: (f) => A(f, `/card-prints/${f.bPrintId}/cards.pdf`) },
  { route: 'POST /api/events/:id/results/tie-breaks', as: 'organiser', why: "a list of cars with show B's car", status: 400, path: (f) => A(f, '/results/tie-breaks'), body: (f) => ({ entryIds: [f.entry, f.bEntry], reason: 'Mixed shows' }) },
  { route: 'DELETE /api/events/:id/results/tie-breaks/:tieBreakId', as: 'organiser', why: "show B's hand order under show A", status: 404, path: (f) => A(f, `/results/tie-breaks/${f.bTieBreak}`) },
  { route: 'GET /api/entries/:id/results', as: 'organiser', why: "show B's entry in the path", status: 404, path: (f) => `/api/entries/${f.bEntry}/results` },
];
