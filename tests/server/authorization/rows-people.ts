import type { ForeignCell, Row } from './matrix';

const unique = (who: string) => `matrix-${who}-${Math.random().toString(36).slice(2, 10)}@example.test`;

/** Sessions, accounts, the site admin, the public JSON and the server's own pages. */
export const PEOPLE_ROWS: Row[] = [
  { route: 'GET /api/health', rule: 'public', ok: 200 },
  { route: 'GET /api/ready', rule: 'public', ok: 200 },
  { route: 'POST /api/payments/webhook', rule: 'public', ok: 400, raw: true, body: () => ({ type: 'payment.succeeded' }), note: 'no signature: refused by the webhook for everyone alike' },
  { route: 'GET /api/public/builds/:code', rule: 'public', ok: 200, path: (f) => `/api/public/builds/${f.build.code}` },
  { route: 'GET /api/public/builds', rule: 'public', ok: 200 },
  { route: 'GET /api/public/events/:slug', rule: 'public', ok: 200, path: (f) => `/api/public/events/${f.showA.slug}` },
  { route: 'GET /api/public/events', rule: 'public', ok: 200 },
  { route: 'GET /api/session', rule: 'public', ok: 200 },
  // A wrong password for an address of nobody: the same 401 whoever asks (a right one would change who the caller is).
  { route: 'POST /api/session', rule: 'public', ok: 401, body: (_f, who) => ({ email: unique(who), password: 'not the password' }) },
  { route: 'DELETE /api/session', rule: 'public', ok: 204, signsOut: true, note: 'signs each caller out: run after every other row' },
  { route: 'POST /api/users', rule: 'public', ok: 202, body: (_f, who) => ({ email: unique(who), password: 'a long enough password', name: 'New Person' }) },
  { route: 'PATCH /api/account', rule: 'signedIn', ok: 200, body: (_f, who) => ({ name: `Matrix ${who}`, hometown: 'Millbrook' }) },
  { route: 'POST /api/account/password', rule: 'signedIn', ok: 400, body: () => ({ currentPassword: 'not my password', newPassword: 'a brand new password' }), note: 'the wrong current password: a 400 naming it' },
  { route: 'POST /api/password-resets', rule: 'public', ok: 202, body: (_f, who) => ({ email: unique(who) }) },
  { route: 'POST /api/password-resets/confirm', rule: 'public', ok: 400, ownAddress: true, body: () => ({ token: 'x'.repeat(43), password: 'long enough password' }) },
  { route: 'POST /api/email-verifications/confirm', rule: 'public', ok: 400, ownAddress: true, body: () => ({ token: 'x'.repeat(43) }) },
  { route: 'POST /api/account/email-verification', rule: 'signedIn', ok: { unconfirmed: 202, else: 409 }, note: 'a confirmed address has nothing to confirm' },
  { route: 'GET /api/admin/users', rule: 'siteAdmin', ok: 200 },
  { route: 'PATCH /api/admin/users/:id', rule: 'siteAdmin', ok: 200, path: (f) => `/api/admin/users/${f.users.spareAccount}`, body: () => ({ mayOrganise: true }) },
  { route: 'GET /api/admin/users/:id', rule: 'siteAdmin', ok: 200, path: (f) => `/api/admin/users/${f.users.buildOwner}` },
  { route: 'PUT /api/admin/users/:id/disabled', rule: 'siteAdmin', ok: 200, path: (f) => `/api/admin/users/${f.users.spareAccount}/disabled`, body: () => ({ disabled: true }) },
  { route: 'POST /api/admin/users/:id/password-reset', rule: 'siteAdmin', ok: 202, path: (f) => `/api/admin/users/${f.users.buildOwner}/password-reset` },
  { route: 'GET /api/admin/mail', rule: 'siteAdmin', ok: 200 },
  { route: 'GET /api/admin/undelivered-mail', rule: 'siteAdmin', ok: 200 },
  { route: 'GET /api/admin/mail/:id', rule: 'siteAdmin', ok: 200, path: (f) => `/api/admin/mail/${f.caughtMail}` },
  { route: 'GET /media/{*key}', rule: 'public', ok: 200, path: (f) => new URL(f.photo.src, 'http://x').pathname },
  // The car is in a show being judged with voting closed: the form is refused the same for everyone.
  { route: 'POST /c/:code/vote', rule: 'public', ok: 403, ownAddress: true, path: (f) => `/c/${f.build.code}/vote`, body: () => ({ token: 'nope' }) },
  { route: 'GET /c/:code/log', rule: 'public', ok: 200, path: (f) => `/c/${f.build.code}/log` },
  { route: 'GET /c/:code/log.atom', rule: 'public', ok: 200, path: (f) => `/c/${f.build.code}/log.atom` },
  { route: 'POST /c/:code/questions', rule: 'public', ok: 303, ownAddress: true, path: (f) => `/c/${f.build.code}/questions`, body: (_f, who) => ({ question: `A question from ${who}?` }) },
  { route: 'GET /c/:code/asked', rule: 'public', ok: 200, path: (f) => `/c/${f.build.code}/asked` },
  { route: 'GET /', rule: 'public', ok: 200 },
  { route: 'GET /c', rule: 'public', ok: 200 },
  { route: 'GET /c/_/oswald-600.woff2', rule: 'public', ok: 200 },
  { route: 'GET /c/:code', rule: 'public', ok: 200, path: (f) => `/c/${f.build.code}` },
  { route: 'GET /e/:slug', rule: 'public', ok: 200, path: (f) => `/e/${f.showA.slug}` },
  { route: 'GET /e/:slug/calendar.ics', rule: 'public', ok: 200, path: (f) => `/e/${f.showA.slug}/calendar.ics` },
  // The app's page for everyone; what the server draws into it for whom is tests/server/api/first-screens.test.ts.
  { route: 'GET /gate/:id', rule: 'public', ok: 200, path: (f) => `/gate/${f.showA.id}` },
  { route: 'GET /judge/:id', rule: 'public', ok: 200, path: (f) => `/judge/${f.showA.id}` },
  { route: 'GET /{*splat}', rule: 'public', ok: 200, path: () => '/builds' },
];

export const PEOPLE_FOREIGN: ForeignCell[] = [];
