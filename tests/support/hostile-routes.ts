import type { z } from 'zod';
import { EventFieldsSchema } from '@shared/schemas/show';
import { SECTION_KINDS } from '@shared/schemas/build-sections';
import type { CallerName, World } from './hostile-world';
import { showSettings } from './event-factory';
import { SHEET } from './judging-factory';

// Who may call each write route and with which path ids, so hostile input reaches validation
// rather than authorization. A write route missing here fails `coverage.test.ts` by name.

export type Group = 'accounts' | 'builds' | 'shows' | 'show-day';

export type RouteTarget = {
  group: Group;
  /** The caller allowed to use the route; `rotate` takes each signed-in person in turn (per-person rate limits). */
  as: CallerName | 'rotate';
  /** Path values; several sets when the body's schema depends on the path (a section per kind). */
  params?: (w: World) => Record<string, string | number> | Array<Record<string, string | number>>;
  /** A body the route's schema accepts, where the schema alone cannot make one (rules across fields, ids of this world). */
  valid?: (w: World) => unknown;
  /** The schema whose fields to walk when the route's schema reads unknown input and checks it with another. */
  fields?: z.ZodType;
  /** Takes multipart as well as JSON, the file in this field: multipart junk is sent too. */
  multipart?: string;
  /** A server page (form posts, HTML answers) rather than the JSON API. */
  page?: boolean;
  /** Reads its own raw bytes (mounted before the JSON parser). */
  rawBody?: boolean;
  /** Why the route parses no input with a zod schema of its own (it is then sent the fixed junk only). */
  noSchema?: string;
};

const event = (w: World) => ({ id: w.ids.eventId });
const build = (w: World) => ({ id: w.ids.buildId });
const entry = (w: World) => ({ id: w.ids.entryId });
const admin = (w: World) => ({ id: w.ids.otherUserId });
const soon = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString();

export const ROUTE_TARGETS: Record<string, RouteTarget> = {
  'POST /api/payments/webhook': { group: 'accounts', as: 'anonymous', rawBody: true, noSchema: 'the raw bytes must carry the payment service signature before any shape is read (tests/server/payments)' },
  'POST /api/session': { group: 'accounts', as: 'anonymous' },
  'DELETE /api/session': { group: 'accounts', as: 'anonymous', noSchema: 'signing out reads no input' },
  'POST /api/users': { group: 'accounts', as: 'anonymous' },
  'PATCH /api/account': { group: 'accounts', as: 'other' },
  'POST /api/account/password': { group: 'accounts', as: 'rotate' },
  'POST /api/password-resets': { group: 'accounts', as: 'anonymous' },
  'POST /api/password-resets/confirm': { group: 'accounts', as: 'anonymous' },
  'POST /api/email-verifications/confirm': { group: 'accounts', as: 'anonymous' },
  'POST /api/account/email-verification': { group: 'accounts', as: 'other', noSchema: 'a new link for the signed-in person reads no input' },
  'PATCH /api/admin/users/:id': { group: 'accounts', as: 'admin', params: admin },
  'PUT /api/admin/users/:id/disabled': { group: 'accounts', as: 'admin', params: admin },
  'POST /api/admin/users/:id/password-reset': { group: 'accounts', as: 'admin', params: admin },
  'POST /api/invitations/:token/accept': { group: 'accounts', as: 'other', params: (w) => ({ token: w.ids.token }) },

  'POST /api/builds': { group: 'builds', as: 'owner' },
  'PATCH /api/builds/:id': { group: 'builds', as: 'owner', params: build },
  'PUT /api/builds/:id/sections/:kind': { group: 'builds', as: 'owner', params: (w) => SECTION_KINDS.map((kind) => ({ id: w.ids.buildId, kind })) },
  'PUT /api/builds/:id/private': { group: 'builds', as: 'owner', params: build },
  'PUT /api/builds/:id/credits': { group: 'builds', as: 'owner', params: build },
  'PUT /api/builds/:id/published': { group: 'builds', as: 'owner', params: build },
  'DELETE /api/builds/:id': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.spareBuildId }) },
  'POST /api/builds/:id/dyno-runs': {
    group: 'builds',
    as: 'owner',
    params: build,
    valid: () => ({ date: '2026-03-02', facility: 'Rolling road', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft', curve: [{ rpm: 3000, power: 150, torque: 260 }, { rpm: 5000, power: 280, torque: 300 }], sheetPhotoId: 1, note: 'Warm day' }),
  },
  'DELETE /api/builds/:id/dyno-runs/:recordId': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, recordId: w.ids.dynoRunId }) },
  'POST /api/builds/:id/dyno-runs/:recordId/apply': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, recordId: w.ids.dynoRunId }) },
  'POST /api/builds/:id/weigh-ins': { group: 'builds', as: 'owner', params: build },
  'DELETE /api/builds/:id/weigh-ins/:recordId': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, recordId: w.ids.weighInId }) },
  'POST /api/builds/:id/weigh-ins/:recordId/apply': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, recordId: w.ids.weighInId }) },
  'POST /api/builds/:id/log': { group: 'builds', as: 'owner', params: build },
  'PATCH /api/builds/:id/log/:postId': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, postId: w.ids.postId }) },
  'DELETE /api/builds/:id/log/:postId': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, postId: w.ids.postId }) },
  'POST /api/builds/:id/questions': { group: 'builds', as: 'owner', params: build },
  'PATCH /api/builds/:id/questions/:questionId': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, questionId: w.ids.questionId }) },
  'POST /api/builds/:id/questions/:questionId/same-as': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, questionId: w.ids.questionId }), valid: (w) => ({ answeredId: w.ids.answeredId }) },
  'DELETE /api/builds/:id/questions/:questionId': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, questionId: w.ids.questionId }) },
  'POST /api/builds/:id/photos': { group: 'builds', as: 'owner', params: build, multipart: 'photos' },
  'PUT /api/builds/:id/photos/order': { group: 'builds', as: 'owner', params: build },
  'PATCH /api/builds/:id/photos/:photoId': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, photoId: w.ids.nothing }) },
  'DELETE /api/builds/:id/photos/:photoId': { group: 'builds', as: 'owner', params: (w) => ({ id: w.ids.buildId, photoId: w.ids.nothing }) },
  'PUT /api/builds/:id/card-settings': { group: 'builds', as: 'owner', params: build },
  'POST /c/:code/vote': { group: 'builds', as: 'anonymous', page: true, params: (w) => ({ code: w.ids.buildCode }), noSchema: 'a visitor\'s vote carries only a form token, compared in constant time with its signed cookie' },
  'POST /c/:code/questions': { group: 'builds', as: 'anonymous', page: true, params: (w) => ({ code: w.ids.buildCode }) },

  'POST /api/events': { group: 'shows', as: 'organiser', fields: EventFieldsSchema, valid: () => showSettings() },
  'PATCH /api/events/:id': { group: 'shows', as: 'organiser', params: event },
  'POST /api/events/:id/lifecycle': { group: 'shows', as: 'organiser', params: event },
  'POST /api/events/:id/classes': { group: 'shows', as: 'organiser', params: event },
  'PATCH /api/events/:id/classes/:classId': { group: 'shows', as: 'organiser', params: (w) => ({ id: w.ids.eventId, classId: w.ids.classId }) },
  'DELETE /api/events/:id/classes/:classId': { group: 'shows', as: 'organiser', params: (w) => ({ id: w.ids.eventId, classId: w.ids.otherClassId }) },
  'PUT /api/events/:id/criteria': { group: 'shows', as: 'organiser', params: event, valid: () => ({ criteria: SHEET }) },
  'POST /api/events/:id/logo': { group: 'shows', as: 'organiser', params: event, multipart: 'logo' },
  'DELETE /api/events/:id/logo': { group: 'shows', as: 'organiser', params: event },
  'POST /api/events/:id/invitations': { group: 'shows', as: 'organiser', params: event },
  'DELETE /api/events/:id/invitations/:invitationId': { group: 'shows', as: 'organiser', params: (w) => ({ id: w.ids.eventId, invitationId: w.ids.invitationId }) },
  'DELETE /api/events/:id/members/:userId/:role': { group: 'shows', as: 'organiser', params: (w) => ({ id: w.ids.eventId, userId: w.ids.judgeId, role: 'judge' }) },
  'POST /api/events/:id/entries': { group: 'shows', as: 'owner', params: event, valid: (w) => ({ buildId: w.ids.buildId, classId: w.ids.otherClassId }) },
  'POST /api/entries/:id/withdraw': { group: 'shows', as: 'owner', params: entry },
  'POST /api/entries/:id/accept-offer': { group: 'shows', as: 'owner', params: entry },
  'POST /api/entries/:id/checkout': { group: 'shows', as: 'owner', params: entry },
  'PUT /api/events/:id/judges/:judgeId/classes': { group: 'show-day', as: 'organiser', params: (w) => ({ id: w.ids.eventId, judgeId: w.ids.judgeId }), valid: (w) => ({ allClasses: false, classIds: [w.ids.classId] }) },
  'PUT /api/events/:id/results/rules': { group: 'show-day', as: 'organiser', params: event },
  'POST /api/events/:id/results/tie-breaks': { group: 'show-day', as: 'organiser', params: event, valid: (w) => ({ entryIds: [w.ids.entryId, w.ids.entryId + 1], reason: 'Paint decides' }) },
  'DELETE /api/events/:id/results/tie-breaks/:tieBreakId': { group: 'show-day', as: 'organiser', params: (w) => ({ id: w.ids.eventId, tieBreakId: w.ids.nothing }) },

  'POST /api/entries/:id/class': { group: 'show-day', as: 'organiser', params: entry },
  'POST /api/entries/:id/mark-paid': { group: 'show-day', as: 'organiser', params: entry },
  'POST /api/entries/:id/move-up': { group: 'show-day', as: 'organiser', params: entry },
  'POST /api/events/:id/gate/check-in': { group: 'show-day', as: 'gate', params: event },
  'POST /api/events/:id/gate/undo': { group: 'show-day', as: 'gate', params: event, valid: (w) => ({ entryId: w.ids.entryId }) },
  'POST /api/events/:id/gate/sync': { group: 'show-day', as: 'gate', params: event },
  'POST /api/events/:id/gate/walk-ups': { group: 'show-day', as: 'gate', params: event },
  'POST /api/events/:id/scores': {
    group: 'show-day',
    as: 'judge',
    params: event,
    valid: (w) => ({
      deviceId: '0b6f3c1e-6d1a-4c57-9f3e-2d8c1a4b5e6f',
      scores: [{ clientId: '1c6f3c1e-6d1a-4c57-9f3e-2d8c1a4b5e60', deviceTime: '2026-03-02T10:00:00+01:00', sequence: 1, entryId: w.ids.entryId, criterionId: w.ids.criterionId, points: 5, comment: 'Clean' }],
      notes: [{ clientId: '2c6f3c1e-6d1a-4c57-9f3e-2d8c1a4b5e61', deviceTime: '2026-03-02T10:00:00+01:00', sequence: 2, entryId: w.ids.entryId, comment: 'Nice' }],
    }),
  },
  'POST /api/events/:id/judging/close': { group: 'show-day', as: 'organiser', params: event },
  'POST /api/events/:id/judging/reopen': { group: 'show-day', as: 'organiser', params: event },
  'POST /api/events/:id/card-prints': { group: 'show-day', as: 'organiser', params: event },
  'POST /api/events/:id/reminders': { group: 'show-day', as: 'organiser', params: event },
  'POST /api/events/:id/peoples-choice/open': { group: 'show-day', as: 'organiser', params: event },
  'POST /api/events/:id/peoples-choice/close': { group: 'show-day', as: 'organiser', params: event },
  'POST /api/events/:id/peoples-choice/void': { group: 'show-day', as: 'organiser', params: event },
  'POST /api/events/:id/peoples-choice/void-burst': { group: 'show-day', as: 'organiser', params: event, valid: () => ({ addressHash: 'a'.repeat(64), from: soon(-1), to: soon(0) }) },
};
