import { csrfSync } from 'csrf-sync';

/**
 * Synchroniser-token CSRF protection: the token lives in the session and must come back in the
 * X-CSRF-Token header on every state-changing request (sign-in and sign-up included).
 */
export const { csrfSynchronisedProtection: csrfProtection, generateToken: csrfToken } = csrfSync({
  getTokenFromRequest: (req) => req.get('x-csrf-token') ?? undefined,
  size: 32,
  errorConfig: { statusCode: 403, code: 'EBADCSRFTOKEN', message: 'Invalid CSRF token' },
});
