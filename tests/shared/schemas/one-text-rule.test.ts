import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { EventFieldsSchema } from '@shared/schemas/show';
import { SECTION_SCHEMAS } from '@shared/schemas/build-sections';
import { textPaths, withValueAt } from '../../support/zod-text-paths';

// Every string a route reads goes through the one text rule (shared/schemas/text.ts): NUL, half an
// emoji and other control characters are refused, and every field has a length limit. The schemas
// are found where the server uses them (each parseBody/parseQuery/parseParams/readForm and safeParse in
// server/routes and server/pages), so a new route's schema is walked the day it is added.

const schemaModules = import.meta.glob<Record<string, unknown>>('../../../shared/schemas/*.ts', { eager: true });
const serverSources = import.meta.glob<string>(['../../../server/routes/*.ts', '../../../server/pages/*.{ts,tsx}'], { eager: true, query: '?raw', import: 'default' });

const isSchema = (v: unknown): v is z.ZodType => typeof v === 'object' && v !== null && '_zod' in v && 'safeParse' in v;
const shared = new Map<string, z.ZodType>();
for (const mod of Object.values(schemaModules)) for (const [name, value] of Object.entries(mod)) if (isSchema(value)) shared.set(name, value);

const used = new Set<string>();
for (const source of Object.values(serverSources)) {
  for (const m of source.matchAll(/(?:parse(?:Body|Query|Params)|readForm)\(req, (\w+)\)/g)) used.add(m[1]!);
  for (const m of source.matchAll(/(\w+Schema)\.safeParse\(/g)) used.add(m[1]!);
}

// Schemas a route defines for itself, by name, so a new local schema with text in it is noticed
// rather than skipped: ids, enums and paths only, or (photo captions) the shared rule itself.
const LOCAL_WITHOUT_TEXT = new Set(['RecordParams', 'ClassParamsSchema', 'TieBreakParamsSchema', 'SectionParamsSchema', 'MemberParamsSchema', 'JudgeParamsSchema', 'InvitationParamsSchema', 'BuildParams', 'AuditQuerySchema', 'PhotoParamsSchema', 'PreviewQuerySchema', 'PhotoUploadFieldsSchema', 'PostParams', 'QuestionParams']);
/** A route's `replaceBody(X)` refuses unknown keys and otherwise is X; a section's schema comes from SECTION_SCHEMAS. */
const WRAPS: Record<string, string[]> = {
  PrivateReplaceSchema: ['BuildPrivateSchema'],
  CreditsReplaceSchema: ['CreditsSchema'],
  CardSettingsReplaceSchema: ['CardSettingsSchema'],
  SECTION: Object.keys(SECTION_SCHEMAS).map((kind) => `section:${kind}`),
  kind: [],
};
for (const [kind, schema] of Object.entries(SECTION_SCHEMAS)) shared.set(`section:${kind}`, schema as z.ZodType);
/** A schema that reads unknown input and checks it with another: walk the other's fields. */
const FIELDS_OF: Record<string, z.ZodType> = { EventCreateSchema: EventFieldsSchema };
/** A password is hashed, never stored or printed, so any character may be part of it; its length is still limited. */
const ANY_CHARACTER = /(^|\.)(password|currentPassword|newPassword)$/;

const walked = [...new Set([...used].flatMap((name) => WRAPS[name] ?? [name]))].filter((name) => shared.has(name)).sort();
const BAD: Array<[string, string]> = [
  ['NUL', 'a\u0000b'],
  ['half of an emoji', 'a\uD83Db'],
  ['a control character', 'bell\u0007'],
  ['DEL and a C1 control', 'x\u007F\u0085'],
];

describe('one text rule for every string a route reads', () => {
  it('finds the route schemas in the shared schemas, and knows every schema a route defines for itself', () => {
    expect(walked.length).toBeGreaterThan(40);
    expect([...used].filter((name) => !shared.has(name) && !LOCAL_WITHOUT_TEXT.has(name) && !(name in WRAPS))).toEqual([]);
  });

  it.each(walked)('%s refuses NUL, half an emoji, control characters and over-long text in each of its strings, naming the field', (name) => {
    const schema = shared.get(name)!;
    for (const path of textPaths(FIELDS_OF[name] ?? schema)) {
      const field = path.join('.');
      const issuesAt = (value: string) => {
        const result = schema.safeParse(withValueAt({}, path, value));
        return result.success ? [] : result.error.issues.filter((i) => i.path.join('.') === field);
      };
      expect(issuesAt('x'.repeat(100_001)), `${name}.${field}: 100,001 characters`).not.toEqual([]);
      if (ANY_CHARACTER.test(field)) continue;
      for (const [what, value] of BAD) expect(issuesAt(value), `${name}.${field}: ${what}`).not.toEqual([]);
    }
  });
});
