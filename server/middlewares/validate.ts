import type { Request } from 'express';
import type { z } from 'zod';
import { fieldsFromIssues } from '@shared/errors';
import { AppError, ValidationError } from '../errors';

/** The schemas a route reads its path, query and body with, as the last request to it parsed them. */
export type RouteInputSchemas = { params?: z.ZodType; query?: z.ZodType; body?: z.ZodType };

/**
 * Every route's own schemas, by "METHOD /api/path/:pattern", noted by the parse helpers below as they
 * run: so the list is what the routes really parse with, kept true by the routes themselves.
 * `tests/server/hostile/` generates hostile input from it for every write route.
 */
export const routeInputSchemas = new Map<string, RouteInputSchemas>();

function note(req: Request, part: keyof RouteInputSchemas, schema: z.ZodType): void {
  const route = (req as { route?: { path?: unknown } }).route;
  if (typeof route?.path !== 'string') return;
  const key = `${req.method} ${req.baseUrl}${route.path}`;
  const known = routeInputSchemas.get(key);
  if (known) known[part] = schema;
  else routeInputSchemas.set(key, { [part]: schema });
}

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
export const parseParams = <S extends z.ZodType>(req: Request, schema: S): z.output<S> => (note(req, 'params', schema), parseWith(schema, req.params));
export const parseQuery = <S extends z.ZodType>(req: Request, schema: S): z.output<S> => (note(req, 'query', schema), parseWith(schema, req.query));
export const parseBody = <S extends z.ZodType>(req: Request, schema: S): z.output<S> => (note(req, 'body', schema), parseWith(schema, requireBody(req)));

/** A server page's form read with a shared schema: the page answers a refusal in words, so this returns the result rather than throwing. */
export const readForm = <S extends z.ZodType>(req: Request, schema: S) => (note(req, 'body', schema), schema.safeParse(req.body ?? {}));

/** A route that reads a body needs one: no body (or zero bytes of JSON) is a 400, never taken for `{}`. */
function requireBody(req: Request): unknown {
  if (req.body === undefined) throw new AppError(400, 'BAD_REQUEST', 'The request has no body: send the fields as a JSON object.', { _: 'Send a JSON object.' });
  return req.body;
}
