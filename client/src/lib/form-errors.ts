import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api';

/**
 * The server's answer split for a form: the messages of the fields it has, and the message for the
 * top of the form (for errors that name no field of this form).
 */
export function splitServerErrors<F extends string>(err: unknown, fieldNames: ReadonlyArray<F>): { fields: Partial<Record<F, string>>; message: string } {
  if (!(err instanceof ApiError)) return { fields: {}, message: 'Something went wrong. Please try again.' };
  const fields: Partial<Record<F, string>> = {};
  let unplaced = false;
  for (const [field, message] of Object.entries(err.fields)) {
    if ((fieldNames as readonly string[]).includes(field)) fields[field as F] = message;
    else unplaced = true;
  }
  return { fields, message: Object.keys(err.fields).length === 0 || unplaced ? err.message : '' };
}

/** Puts the server's field errors on a react-hook-form form; returns the message for the top of the form. */
export function applyServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, fieldNames: ReadonlyArray<Path<T>>): string {
  const { fields, message } = splitServerErrors(err, fieldNames);
  for (const [field, text] of Object.entries(fields)) setError(field as Path<T>, { type: 'server', message: text as string });
  return message;
}

/** The first message zod gives for each top-level field, for a form checked without a form library. */
export function fieldMessages<F extends string>(error: { issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }> }): Partial<Record<F, string>> {
  const out: Partial<Record<F, string>> = {};
  for (const issue of error.issues) {
    const field = String(issue.path[0] ?? '') as F;
    out[field] ??= issue.message;
  }
  return out;
}

/** The names of the server's field errors that sit under these top-level fields (rows of a list: `criteria.2.name`). */
export function serverFieldsUnder(err: unknown, topLevel: readonly string[]): string[] {
  return err instanceof ApiError ? Object.keys(err.fields).filter((f) => topLevel.includes(f.split('.')[0]!)) : [];
}
