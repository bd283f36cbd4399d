import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { fieldsFromIssues } from '@shared/errors';
import { AppError, ValidationError } from '../errors';

type Part = 'body' | 'query' | 'params';

/** Parses a value with a shared zod schema and keeps its type; a failure is a 400 naming each field. */
export function parseWith<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (!result.success) throw new ValidationError(fieldsFromIssues(result.error.issues));
  return result.data;
}

/**
 * The typed way for a route to read its input, first thing in the handler:
 * `const { id } = parseParams(req, IdParamSchema); const input = parseBody(req, EntryCreateSchema);`
 * A schema change that breaks a route then fails `npm run typecheck`.
 */
export const parseParams = <S extends z.ZodType>(req: Request, schema: S): z.output<S> => parseWith(schema, req.params);
export const parseQuery = <S extends z.ZodType>(req: Request, schema: S): z.output<S> => parseWith(schema, req.query);
export const parseBody = <S extends z.ZodType>(req: Request, schema: S): z.output<S> => parseWith(schema, requireBody(req));

/** A route that reads a body needs one: no body (or zero bytes of JSON) is a 400, never taken for `{}`. */
function requireBody(req: Request): unknown {
  if (req.body === undefined) throw new AppError(400, 'BAD_REQUEST', 'The request has no body: send the fields as a JSON object.', { _: 'Send a JSON object.' });
  return req.body;
}

/**
 * Older middleware form: the parsed value lands in res.locals[part]. Being replaced by the
 * parse helpers above, which keep the type; new routes use those.
 */
export function validate<S extends z.ZodType>(part: Part, schema: S): RequestHandler {
  return (req, res, next) => {
    res.locals[part] = parseWith(schema, part === 'body' ? requireBody(req) : req[part]);
    next();
  };
}
