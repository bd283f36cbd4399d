import type { FieldValues, Resolver, UseFormSetError, Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyServerErrors } from '@client/lib/form-errors';
import { ApiError } from '@client/lib/api';

const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/**
 * Form values → what the section schema reads: empty boxes and "not said" choices are dropped,
 * so a half-filled section saves. Rows of a list keep their blanks, so an error lands on the row
 * the owner sees (dropping a row would shift every index after it).
 */
export function cleanValues(value: unknown, inRow = false): unknown {
  if (Array.isArray(value)) return withoutTrailingBlankRows(value.map((item) => cleanValues(item, true)));
  if (!isPlainObject(value)) return value;
  const out: Record<string, unknown> = {};
  for (const [key, child] of Object.entries(value)) {
    const cleaned = cleanValues(child);
    if (cleaned === undefined || cleaned === null) continue;
    if (cleaned === '' && !inRow) continue;
    if (isPlainObject(cleaned) && Object.keys(cleaned).length === 0) continue;
    out[key] = cleaned;
  }
  // "Made by" with no choice made says nothing.
  if ('madeBy' in out && isPlainObject(out.madeBy) && !out.madeBy.kind) delete out.madeBy;
  return out;
}

const isBlankRow = (row: unknown) => isPlainObject(row) && Object.values(row).every((v) => v === '' || v === undefined || v === null);

/**
 * A row just added and not filled in yet is not sent (nor checked): the panel does not complain
 * while the owner is still to type. Only rows at the end go, so no row before them changes index.
 */
export function withoutTrailingBlankRows<R>(rows: R[]): R[] {
  let end = rows.length;
  while (end > 0 && isBlankRow(rows[end - 1])) end--;
  return end === rows.length ? rows : rows.slice(0, end);
}

/** zodResolver over cleaned values: the shared schema checks exactly what will be sent. */
export function formResolver<T extends FieldValues>(schema: z.ZodType, clean: (values: T) => unknown = (v) => cleanValues(v)): Resolver<T> {
  const inner = zodResolver(schema as never) as unknown as Resolver<T>;
  return (values, context, options) => inner(clean(values) as T, context, options);
}

/** The server's field errors on this form's fields (any path under a field the schema knows). */
export function placeServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, topLevel: readonly string[]): string {
  const names = err instanceof ApiError ? Object.keys(err.fields).filter((f) => topLevel.includes(f.split('.')[0]!)) : [];
  return applyServerErrors(err, setError, names as Path<T>[]);
}

/** Fills missing text and choice fields with '' so an untouched form is not "unsaved". */
export function withBlanks<T>(values: object | undefined, paths: readonly string[]): T {
  const out = structuredClone((values ?? {}) as Record<string, unknown>);
  for (const path of paths) {
    const keys = path.split('.');
    let at: Record<string, unknown> = out;
    for (const key of keys.slice(0, -1)) {
      if (!isPlainObject(at[key])) at[key] = {};
      at = at[key] as Record<string, unknown>;
    }
    const last = keys[keys.length - 1]!;
    if (at[last] === undefined || at[last] === null) at[last] = '';
  }
  return out as T;
}

/** For number boxes registered with react-hook-form: empty is "not said", anything else must read as a number. */
export const asNumber = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : typeof v === 'number' ? v : Number(String(v).trim().replace(',', '.'))) };

export const MADE_BY_BLANKS = ['madeBy.kind', 'madeBy.name', 'note'] as const;

/** JSON with sorted keys: two objects that say the same thing give the same text. */
export function stableStringify(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) => (isPlainObject(v) ? Object.fromEntries(Object.keys(v).sort().map((k) => [k, v[k]])) : v));
}
