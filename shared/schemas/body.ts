import type { z } from 'zod';

/**
 * The body of a whole-object replace (PUT of a section, the private fields, the card settings):
 * every key must be one the schema knows, so a body of only unknown keys (or a misspelt one) is a
 * 400 naming them, never a silent replace with nothing. `{}` stays a deliberate "clear it all".
 * (A request with no body at all is refused before any schema: see parseBody on the server.)
 */
export const replaceBody = <Shape extends z.core.$ZodShape>(schema: z.ZodObject<Shape>) => schema.strict();
