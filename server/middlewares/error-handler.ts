import type { ErrorRequestHandler, RequestHandler } from 'express';
import { UniqueConstraintError, ValidationError as SequelizeValidationError } from 'sequelize';
import { ZodError } from 'zod';
import { fieldsFromIssues, type ErrorResponse } from '@shared/errors';
import { AppError, NotFoundError, UnavailableError } from '../errors';
import { isDatabaseUnavailable } from '../services/platform/database-unavailable';

export const apiNotFound: RequestHandler = () => {
  throw new NotFoundError('No such API endpoint.');
};

function toAppError(err: unknown): AppError | undefined {
  if (err instanceof AppError) return err;
  if (isDatabaseUnavailable(err)) return new UnavailableError();
  if (err instanceof ZodError) return new AppError(400, 'VALIDATION_FAILED', 'Some fields need attention.', fieldsFromIssues(err.issues));
  if (err instanceof UniqueConstraintError) {
    const fields = Object.fromEntries(err.errors.map((e) => [e.path ?? '_', `This ${e.path ?? 'value'} is already taken.`]));
    return new AppError(409, 'CONFLICT', 'That is already taken.', fields);
  }
  if (err instanceof SequelizeValidationError) {
    return new AppError(400, 'VALIDATION_FAILED', 'Some fields need attention.', Object.fromEntries(err.errors.map((e) => [e.path ?? '_', e.message])));
  }
  const e = err as { code?: string; type?: string; status?: number };
  if (e?.code === 'EBADCSRFTOKEN') return new AppError(403, 'CSRF_INVALID', 'Your session expired or the form is stale. Reload the page and try again.');
  if (e?.type === 'entity.parse.failed') return new AppError(400, 'BAD_REQUEST', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new AppError(413, 'PAYLOAD_TOO_LARGE', 'The request is too large.');
  // Express, the body parser and static files throw http-errors for the client's own mistakes (a broken
  // %-escape in the path, an unknown charset, a missing asset): answer those with their status, in our
  // words (their messages can name files on the server, so they are never passed on).
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
    if (e.status === 404) return new NotFoundError();
    if (e.status === 415) return new AppError(415, 'UNSUPPORTED_MEDIA_TYPE', 'The request body is in an encoding we do not read: send UTF-8 JSON.');
    return new AppError(e.status, 'BAD_REQUEST', 'The request could not be read.');
  }
  return undefined;
}

/** Last middleware: one error shape, no stack traces to the client, unknown errors logged as 500. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = toAppError(err);
  if (!known) req.log?.error({ err }, 'unhandled error');
  else if (known instanceof UnavailableError) {
    req.log?.warn({ err }, 'database unavailable');
    if (!res.headersSent) res.set('Retry-After', '5');
  }
  const status = known?.status ?? 500;
  const body: ErrorResponse = {
    error: {
      code: known?.code ?? 'INTERNAL',
      message: known?.message ?? 'Something went wrong on our side. Please try again.',
      ...(known?.fields ? { fields: known.fields } : {}),
    },
  };
  if (res.headersSent) return;
  res.status(status).json(body);
};
