import type { z } from 'zod';

type Def = Record<string, unknown> & { type: string };
const defOf = (schema: z.ZodType) => (schema as unknown as { _zod: { def: Def } })._zod.def;

/** Paths of every string leaf of a zod schema ("lines.0.value" for the first row of a list). */
export function textPaths(schema: z.ZodType, prefix: string[] = []): string[][] {
  const def = defOf(schema);
  const inner = (key: string) => textPaths(def[key] as z.ZodType, prefix);
  switch (def.type) {
    case 'string':
      return [prefix];
    case 'object':
      return Object.entries(def.shape as Record<string, z.ZodType>).flatMap(([k, s]) => textPaths(s, [...prefix, k]));
    case 'array':
      return textPaths(def.element as z.ZodType, [...prefix, '0']);
    case 'union':
      return unique((def.options as z.ZodType[]).flatMap((o) => textPaths(o, prefix)));
    case 'optional':
    case 'nullable':
    case 'default':
    case 'prefault':
    case 'nonoptional':
    case 'readonly':
    case 'catch':
      return inner('innerType');
    case 'pipe': // a preprocess puts the schema on the way out, a transform on the way in
      return unique([...inner('in'), ...inner('out')]);
    default:
      return [];
  }
}

function unique(paths: string[][]): string[][] {
  const seen = new Set<string>();
  return paths.filter((p) => !seen.has(p.join('.')) && seen.add(p.join('.')));
}

/** A copy of `base` with `value` at `path`, creating the objects on the way. */
export function withValueAt(base: object, path: string[], value: string): object {
  const copy = structuredClone(base) as Record<string, unknown>;
  let at = copy;
  path.slice(0, -1).forEach((key, i) => {
    at = (at[key] ??= /^\d+$/.test(path[i + 1]!) ? [] : {}) as Record<string, unknown>;
  });
  at[path[path.length - 1]!] = value;
  return copy;
}
