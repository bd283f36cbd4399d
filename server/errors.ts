import type { ErrorCode } from '@shared/errors';

/** The one error type services and routes throw; the error middleware turns it into the error shape. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export class ValidationError extends AppError {
  constructor(fields: Record<string, string>, message = 'Some fields need attention.') {
    super(400, 'VALIDATION_FAILED', message, fields);
  }
}
export class UnauthenticatedError extends AppError {
  constructor(message = 'Sign in to continue.') {
    super(401, 'UNAUTHENTICATED', message);
  }
}
export class ForbiddenError extends AppError {
  constructor(message = 'You do not have permission to do that.') {
    super(403, 'FORBIDDEN', message);
  }
}
export class NotFoundError extends AppError {
  constructor(message = 'Not found.') {
    super(404, 'NOT_FOUND', message);
  }
}
export class ConflictError extends AppError {
  constructor(message: string, fields?: Record<string, string>) {
    super(409, 'CONFLICT', message, fields);
  }
}
/** The database (or another service a request needs) cannot be reached: try again shortly. */
export class UnavailableError extends AppError {
  constructor(message = 'Placard cannot reach its database right now. Please try again in a moment.') {
    super(503, 'UNAVAILABLE', message);
  }
}
