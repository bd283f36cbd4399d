import { z } from 'zod';

/** Largest value a PostgreSQL `integer` column holds: every id, and any whole number kept in such a column. */
export const MAX_INTEGER_COLUMN = 2_147_483_647;
const MAX_ID = MAX_INTEGER_COLUMN;

/**
 * A row id in a path: decimal digits only. `0x25`, `37e0`, ` 37` and `37 ` are refused,
 * so one id has exactly one spelling and nothing is read loosely.
 */
export const IdSchema = z
  .string({ error: 'Id is required.' })
  .regex(/^[1-9][0-9]{0,9}$/, { error: 'Id must be a positive whole number in decimal digits.' })
  .transform(Number)
  .refine((n) => n <= MAX_ID, { error: 'Id is too large.' });

export const IdParamSchema = z.object({ id: IdSchema });
export type IdParam = z.infer<typeof IdParamSchema>;
