import type { ForeignCell, Row } from './matrix';

const CARD = { design: 'poster', paper: 'letter', orientation: 'portrait', sections: ['engine'], figures: ['power'], units: 'imperial' };
const WEIGH_IN = { date: '2026-06-01', unit: 'kg', leftFront: 330, rightFront: 322, leftRear: 318, rightRear: 317, withDriver: false, fuelLevel: 'full' };
const DYNO_RUN = { date: '2026-05-30', facility: 'A rolling-road shop', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft', peakPower: 512.4, peakPowerRpm: 6200, peakTorque: 488, peakTorqueRpm: 4400 };
const b = (f: { build: { id: number } }, rest = '') => `/api/builds/${f.build.id}${rest}`;

/** The owner's builds and everything on them. Rows whose target goes away carry their own (the spare build). */
export const BUILD_ROWS: Row[] = [
  { route: 'GET /api/builds', rule: 'signedIn', ok: 200, note: 'each caller gets their own list' },
  { route: 'POST /api/builds', rule: 'signedIn', ok: 201, body: () => ({ title: 'A new build' }) },
  { route: 'GET /api/builds/:id', rule: 'buildOwner', ok: 200 },
  { route: 'PATCH /api/builds/:id', rule: 'buildOwner', ok: 200, body: () => ({ title: 'Matrix coupe' }) },
  { route: 'PUT /api/builds/:id/sections/:kind', rule: 'buildOwner', ok: 200, path: (f) => b(f, '/sections/wheels'), body: () => ({}) },
  { route: 'PUT /api/builds/:id/private', rule: 'buildOwner', ok: 200, body: () => ({ vin: 'MATRIXVIN0001' }) },
  { route: 'PUT /api/builds/:id/credits', rule: 'buildOwner', ok: 200, body: () => ({ credits: [{ role: 'paint', name: 'A painter' }] }) },
  { route: 'PUT /api/builds/:id/published', rule: 'buildOwner', ok: 200, body: () => ({ published: true }) },
  { route: 'DELETE /api/builds/:id', rule: 'buildOwner', ok: 204, path: (f) => `/api/builds/${f.spareBuild}` },
  { route: 'POST /api/builds/:id/dyno-runs', rule: 'buildOwner', ok: 201, body: () => DYNO_RUN },
  { route: 'POST /api/builds/:id/dyno-runs/:recordId/apply', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/dyno-runs/${f.dynoRunId}/apply`) },
  { route: 'DELETE /api/builds/:id/dyno-runs/:recordId', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/dyno-runs/${f.dynoRunId}`), note: 'answers the build as it is now' },
  { route: 'POST /api/builds/:id/weigh-ins', rule: 'buildOwner', ok: 201, body: () => WEIGH_IN },
  { route: 'POST /api/builds/:id/weigh-ins/:recordId/apply', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/weigh-ins/${f.weighInId}/apply`) },
  { route: 'DELETE /api/builds/:id/weigh-ins/:recordId', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/weigh-ins/${f.weighInId}`), note: 'answers the build as it is now' },
  { route: 'GET /api/builds/:id/log', rule: 'buildOwner', ok: 200 },
  { route: 'POST /api/builds/:id/log', rule: 'buildOwner', ok: 201, body: () => ({ postedOn: '2025-10-01', title: 'Second post', body: 'More.', status: 'draft' }) },
  { route: 'PATCH /api/builds/:id/log/:postId', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/log/${f.logPost}`), body: () => ({ title: 'First fire-up, again' }) },
  { route: 'DELETE /api/builds/:id/log/:postId', rule: 'buildOwner', ok: 204, path: (f) => b(f, `/log/${f.logPost}`), last: true },
  { route: 'GET /api/builds/:id/questions', rule: 'buildOwner', ok: 200 },
  { route: 'POST /api/builds/:id/questions', rule: 'buildOwner', ok: 201, body: () => ({ question: 'Does it run?', answer: 'Yes.' }) },
  { route: 'PATCH /api/builds/:id/questions/:questionId', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/questions/${f.question}`), body: () => ({ answer: 'Every weekend, rain or not.' }) },
  { route: 'POST /api/builds/:id/questions/:questionId/same-as', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/questions/${f.waitingQuestion}/same-as`), body: (f) => ({ answeredId: f.question }), note: "a visitor's waiting question, the same as an answered one" },
  { route: 'DELETE /api/builds/:id/questions/:questionId', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/questions/${f.question}`), last: true },
  { route: 'POST /api/builds/:id/photos', rule: 'buildOwner', ok: 400, note: 'no file sent: refused after the build is authorized' },
  { route: 'PUT /api/builds/:id/photos/order', rule: 'buildOwner', ok: 200, body: (f) => ({ photoIds: [f.photo.id] }) },
  { route: 'PATCH /api/builds/:id/photos/:photoId', rule: 'buildOwner', ok: 200, path: (f) => b(f, `/photos/${f.photo.id}`), body: () => ({ caption: 'Side on' }) },
  { route: 'DELETE /api/builds/:id/photos/:photoId', rule: 'buildOwner', ok: 204, path: (f) => b(f, `/photos/${f.photo.id}`), last: true },
  { route: 'GET /api/builds/:id/card-settings', rule: 'buildOwner', ok: 200 },
  { route: 'PUT /api/builds/:id/card-settings', rule: 'buildOwner', ok: 200, body: () => CARD },
  { route: 'GET /api/builds/:id/card.pdf', rule: 'buildOwner', ok: 200 },
  { route: 'GET /api/builds/:id/qr.png', rule: 'buildOwner', ok: 200 },
  { route: 'GET /api/builds/:id/qr.svg', rule: 'buildOwner', ok: 200 },
  { route: 'GET /api/builds/:id/preview', rule: 'buildOwner', ok: 200 },
];

/** The owner of the build, with another owner's records in the path or body. */
export const BUILD_FOREIGN: ForeignCell[] = [
  { route: 'POST /api/builds/:id/dyno-runs', as: 'buildOwner', why: "another owner's photo as the dyno sheet", status: 400, path: (f) => b(f, '/dyno-runs'), body: (f) => ({ ...DYNO_RUN, sheetPhotoId: f.foreign.photo }) },
  {
    route: 'POST /api/builds/:id/log',
    as: 'buildOwner',
    why: "a list of photos with another owner's photo",
    status: 400,
    path: (f) => b(f, '/log'),
    body: (f) => ({ postedOn: '2025-10-02', title: 'Borrowed', body: 'Not mine.', photoIds: [f.photo.id, f.foreign.photo] }),
  },
  { route: 'POST /api/builds/:id/log', as: 'buildOwner', why: "another owner's dyno run linked", status: 400, path: (f) => b(f, '/log'), body: (f) => ({ postedOn: '2025-10-02', title: 'Borrowed', body: 'Not mine.', dynoRunId: f.foreign.dynoRunId }) },
  { route: 'PATCH /api/builds/:id/log/:postId', as: 'buildOwner', why: "a list of photos with another owner's photo", status: 400, path: (f) => b(f, `/log/${f.logPost}`), body: (f) => ({ photoIds: [f.foreign.photo] }) },
  { route: 'DELETE /api/builds/:id/dyno-runs/:recordId', as: 'buildOwner', why: "another owner's dyno run under my build", status: 404, path: (f) => b(f, `/dyno-runs/${f.foreign.dynoRunId}`) },
  { route: 'POST /api/builds/:id/dyno-runs/:recordId/apply', as: 'buildOwner', why: "another owner's dyno run under my build", status: 404, path: (f) => b(f, `/dyno-runs/${f.foreign.dynoRunId}/apply`) },
  { route: 'PATCH /api/builds/:id/log/:postId', as: 'buildOwner', why: "another owner's log post under my build", status: 404, path: (f) => b(f, `/log/${f.foreign.logPost}`), body: () => ({ title: 'Mine now' }) },
  { route: 'DELETE /api/builds/:id/log/:postId', as: 'buildOwner', why: "another owner's log post under my build", status: 404, path: (f) => b(f, `/log/${f.foreign.logPost}`) },
  { route: 'PATCH /api/builds/:id/questions/:questionId', as: 'buildOwner', why: "another owner's question under my build", status: 404, path: (f) => b(f, `/questions/${f.foreign.question}`), body: () => ({ answer: 'Mine now' }) },
  { route: 'POST /api/builds/:id/questions/:questionId/same-as', as: 'buildOwner', why: "another owner's answered question in the body", status: 400, path: (f) => b(f, `/questions/${f.waitingQuestion}/same-as`), body: (f) => ({ answeredId: f.foreign.question }) },
  { route: 'PUT /api/builds/:id/photos/order', as: 'buildOwner', why: "the list holds another owner's photo", status: 400, path: (f) => b(f, '/photos/order'), body: (f) => ({ photoIds: [f.photo.id, f.foreign.photo] }) },
  { route: 'PATCH /api/builds/:id/photos/:photoId', as: 'buildOwner', why: "another owner's photo under my build", status: 404, path: (f) => b(f, `/photos/${f.foreign.photo}`), body: () => ({ caption: 'Mine now' }) },
  { route: 'DELETE /api/builds/:id/photos/:photoId', as: 'buildOwner', why: "another owner's photo under my build", status: 404, path: (f) => b(f, `/photos/${f.foreign.photo}`) },
  { route: 'PUT /api/builds/:id/card-settings', as: 'buildOwner', why: "another owner's question as the card's highlight", status: 400, path: (f) => b(f, '/card-settings'), body: (f) => ({ ...CARD, highlight: { kind: 'question', id: f.foreign.question } }) },
  // Drawn without it: a card's highlight is looked up among this build's own published posts only.
  { route: 'GET /api/builds/:id/card.pdf', as: 'buildOwner', why: "another owner's log post as the card's highlight", status: 200, path: (f) => b(f, `/card.pdf?highlight=log:${f.foreign.logPost}`) },
];
