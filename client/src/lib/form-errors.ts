import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api';

/**
 * Puts the server's field errors on the form's fields; returns the message for the top of the form
 * (for errors that name no field of this form).
 */
export function applyServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, fieldNames: ReadonlyArray<Path<T>>): string {
  if (!(err instanceof ApiError)) return 'Something went wrong. Please try again.';
  let unplaced = false;
  for (const [field, message] of Object.entries(err.fields)) {
    if ((fieldNames as readonly string[]).includes(field)) setError(field as Path<T>, { type: 'server', message });
    else unplaced = true;
  }
  return Object.keys(err.fields).length === 0 || unplaced ? err.message : '';
}
