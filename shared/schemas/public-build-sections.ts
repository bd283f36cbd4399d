// What of each spec section may leave the server. A section is stored as JSON, so anything that
// ever lands in it (an old key, a bug, a field meant to stay private) would otherwise travel whole
// to the public page, its JSON twin and every card. These schemas name the keys that may go; zod
// objects drop every key they do not name, nested ones too (parse, don't pass).
import type { z } from 'zod';
import { SECTION_KINDS, SECTION_SCHEMAS, type SectionKind, type Sections } from './build-sections';
import { BuildOverviewSchema } from './build';
import type { FigureInput } from './figure';

/**
 * Every field of a section is public today, so each public schema is its section's schema. A private
 * field added to a section later is left out here: `{ ...SECTION_SCHEMAS, engine: EngineSectionSchema.omit({ field: true }) }`.
 */
export const PUBLIC_SECTION_SCHEMAS = SECTION_SCHEMAS satisfies Record<SectionKind, z.ZodType>;

const PublicWeightSchema = BuildOverviewSchema.shape.weight.unwrap().unwrap();

/**
 * Only the named keys of one stored section. A stored value the rules refuse today (a range
 * narrowed since it was saved) leaves just its own top-level field out, not the whole section.
 */
export function publicSection<K extends SectionKind>(kind: K, stored: unknown): Sections[K] | undefined {
  const schema = PUBLIC_SECTION_SCHEMAS[kind] as unknown as z.ZodType<Sections[K]>;
  let data = stored;
  for (let attempt = 0; attempt < 3; attempt++) {
    const parsed = schema.safeParse(data);
    if (parsed.success) return parsed.data;
    if (!data || typeof data !== 'object' || Array.isArray(data)) return undefined;
    const refused = new Set(parsed.error.issues.map((i) => i.path[0]));
    if (refused.has(undefined)) return undefined;
    data = Object.fromEntries(Object.entries(data).filter(([key]) => !refused.has(key)));
  }
  return undefined;
}

/** The public sections of a build from its stored rows, in no particular order. */
export function publicSections(stored: Array<{ kind: SectionKind; data: unknown }>): Sections {
  const out: Record<string, unknown> = {};
  for (const { kind, data } of stored) {
    if (!SECTION_KINDS.includes(kind)) continue;
    const section = publicSection(kind, data);
    if (section) out[kind] = section;
  }
  return out as Sections;
}

/** The build's weight with only a figure's named keys, or null when it does not read as one. */
export function publicWeight(stored: unknown): FigureInput | null {
  if (stored == null) return null;
  const parsed = PublicWeightSchema.safeParse(stored);
  return parsed.success ? parsed.data : null;
}
