import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { fieldsFromIssues } from '@shared/errors';
import { ValidationError } from '../errors';

type Part = 'body' | 'query' | 'params';

/**
 * Parses one part of the request with a shared zod schema; the parsed value lands in
 * res.locals[part] (Express 5's req.query is read-only). A failure is a 400 naming each field.
 */
export function validate<S extends z.ZodType>(part: Part, schema: S): RequestHandler {
  return (req, res, next) => {
    const result = schema.safeParse(req[part] ?? {});
    if (!result.success) throw new ValidationError(fieldsFromIssues(result.error.issues));
    res.locals[part] = result.data;
    next();
  };
}

