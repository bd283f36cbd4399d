import { z } from 'zod';

/** Every error the API returns has one of these codes. */
export const ERROR_CODES = [
  'BAD_REQUEST',
  'VALIDATION_FAILED',
  'UNAUTHENTICATED',
  'FORBIDDEN',
  'CSRF_INVALID',
  'NOT_FOUND',
  'CONFLICT',
  'RATE_LIMITED',
  'PAYLOAD_TOO_LARGE',
  'UNSUPPORTED_MEDIA_TYPE',
  'UNAVAILABLE',
  'INTERNAL',
] as const;
export type ErrorCode = (typeof ERROR_CODES)[number];

/** `fields` maps a dotted field path ("email", "gears.2") to what is wrong with it. */
export const ErrorResponseSchema = z.object({
  error: z.object({
    code: z.enum(ERROR_CODES),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ErrorResponse = z.infer<typeof ErrorResponseSchema>;

type Issue = { path: PropertyKey[]; message: string; code?: string; keys?: readonly string[] };

/**
 * Turns zod issues into the `fields` map of the error shape (first message per field wins).
 * A key the schema does not know (a strict object's `unrecognized_keys`) is named as its own field.
 */
export function fieldsFromIssues(issues: ReadonlyArray<Issue>): Record<string, string> {
  // A Map, not an object: a key such as "__proto__" or "constructor" is a field like any other
  // (an object would take it for one of its own built-ins and leave it unnamed).
  const fields = new Map<string, string>();
  const put = (key: string, message: string) => {
    if (!fields.has(key)) fields.set(key, message);
  };
  for (const issue of issues) {
    const at = issue.path.map(String).join('.');
    if (issue.code === 'unrecognized_keys' && issue.keys?.length) {
      for (const k of issue.keys) put(at ? `${at}.${k}` : k, `There is no field "${k}" here.`);
    } else put(at || '_', issue.message);
  }
  return Object.fromEntries(fields);
}
