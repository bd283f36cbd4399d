import fc from 'fast-check';
import type { z } from 'zod';
import { fieldsFromIssues } from '@shared/errors';

// Hostile request bodies made from a route's own zod schema (zod 4's `_zod.def`): a valid example,
// every field of it, values each kind of field must refuse, and fast-check arbitraries over them.
// Every body offered is first checked against the schema here: only bodies the schema refuses are
// sent, so the server must refuse each one, naming the same fields.

type Def = Record<string, unknown> & { type: string; checks?: Array<{ _zod: { def: Record<string, unknown> } }> };
const defOf = (schema: z.ZodType) => (schema as unknown as { _zod: { def: Def } })._zod.def;
const checksOf = (schema: z.ZodType) => (defOf(schema).checks ?? []).map((c) => c._zod.def);
const accepts = (schema: z.ZodType, value: unknown) => schema.safeParse(value).success;

/** A number JSON can carry only as text: `1e999` parses to Infinity, which JSON.stringify cannot write. */
export const RAW_INFINITY = '\u0001raw:1e999\u0001';
const RAW_INFINITY_JSON = JSON.stringify(RAW_INFINITY);

/** The JSON text of a body, with the raw-number markers written as the bare numbers they stand for. */
export const jsonText = (body: unknown) => JSON.stringify(body).split(RAW_INFINITY_JSON).join('1e999');
/** The body as the server's JSON parser will hand it over. */
export const asReceived = (body: unknown): unknown => JSON.parse(jsonText(body));

/** The fields the schema names for a body it refuses, as the server's error shape lists them; null if it accepts it. */
export function refusedFields(schema: z.ZodType, body: unknown): Record<string, string> | null {
  const result = schema.safeParse(asReceived(body));
  return result.success ? null : fieldsFromIssues(result.error.issues);
}

// ---- the shape of a schema ----

/** Through the wrappers that do not change what a field is: optional, nullable, default, pipes, lazy. */
function core(schema: z.ZodType): { schema: z.ZodType; optional: boolean; nullable: boolean } {
  let s = schema;
  let optional = false;
  let nullable = false;
  for (let i = 0; i < 20; i++) {
    const def = defOf(s);
    if (def.type === 'optional' || def.type === 'default' || def.type === 'prefault') optional = true;
    if (def.type === 'nullable') nullable = true;
    if (['optional', 'nullable', 'default', 'prefault', 'readonly', 'catch', 'nonoptional'].includes(def.type)) s = def.innerType as z.ZodType;
    else if (def.type === 'pipe') s = def.in as z.ZodType;
    else if (def.type === 'lazy') s = (def.getter as () => z.ZodType)();
    else break;
  }
  return { schema: s, optional, nullable };
}

const lengthLimit = (schema: z.ZodType, check: 'max_length' | 'min_length') => {
  const found = checksOf(schema).filter((c) => c.check === check).map((c) => Number(c[check === 'max_length' ? 'maximum' : 'minimum']));
  return found.length ? (check === 'max_length' ? Math.min(...found) : Math.max(...found)) : undefined;
};

// ---- a valid example ----

const STRING_CANDIDATES = [
  'Plain words',
  'abc',
  'a',
  '2026-03-02',
  '2026-03-02T10:00:00.000Z',
  '2026-03-02T10:00',
  '0b6f3c1e-6d1a-4c57-9f3e-2d8c1a4b5e6f',
  '0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef',
  'Europe/Berlin',
  'EUR',
  'ABCD2345',
  '12:30',
  '#cc3300',
  'https://example.test/a',
  '1',
];
const NUMBER_CANDIDATES = [1, 2, 3, 10, 0, 5, 100, 1000, 2026, 0.5, 50, 99, -1];

/** A value the schema accepts, made from the schema alone (best effort: cross-field rules may need a given example). */
export function exampleOf(schema: z.ZodType, emailTag: string, depth = 0): unknown {
  if (depth > 12) return undefined;
  const { schema: s, optional, nullable } = core(schema);
  const def = defOf(s);
  const pick = (candidates: unknown[]) => candidates.find((c) => accepts(schema, c));
  switch (def.type) {
    case 'string': {
      const min = lengthLimit(s, 'min_length') ?? 0;
      return pick([...STRING_CANDIDATES, `hostile-${emailTag}@example.test`, 'x'.repeat(Math.max(min, 1))]) ?? (optional ? undefined : nullable ? null : undefined);
    }
    case 'number':
    case 'int':
      return pick(NUMBER_CANDIDATES);
    case 'boolean':
      return pick([true, false]);
    case 'enum':
      return pick(Object.values(def.entries as Record<string, unknown>));
    case 'literal':
      return pick(def.values as unknown[]);
    case 'null':
      return null;
    case 'array': {
      const item = exampleOf(def.element as z.ZodType, emailTag, depth + 1);
      const min = lengthLimit(s, 'min_length') ?? 0;
      // One item first, so the item's own fields are walked too.
      return pick([[item], [], Array.from({ length: Math.max(min, 2) }, () => item)]);
    }
    case 'object': {
      const shape = def.shape as Record<string, z.ZodType>;
      const all: Record<string, unknown> = {};
      const required: Record<string, unknown> = {};
      for (const [key, field] of Object.entries(shape)) {
        const value = exampleOf(field, emailTag, depth + 1);
        if (value === undefined) continue;
        all[key] = value;
        if (!core(field).optional) required[key] = value;
      }
      return pick([all, required]);
    }
    case 'union': {
      for (const option of def.options as z.ZodType[]) {
        const value = exampleOf(option, emailTag, depth + 1);
        if (value !== undefined && accepts(schema, value)) return value;
      }
      return undefined;
    }
    case 'record':
      return pick([{}]);
    case 'tuple':
      return pick([(def.items as z.ZodType[]).map((item) => exampleOf(item, emailTag, depth + 1))]);
    default:
      return pick(['x', 1, true, {}, []]);
  }
}

// ---- the fields of a body ----

export type FieldKind = 'string' | 'number' | 'boolean' | 'enum' | 'literal' | 'array' | 'object' | 'other';
export type Field = { path: string[]; kind: FieldKind; optional: boolean; nullable: boolean; maxLength?: number; strict?: boolean; element?: unknown };

/** Every field of a schema that the example holds (array elements through their first item), the body itself first. */
export function fieldsOf(schema: z.ZodType, example: unknown, path: string[] = []): Field[] {
  const { schema: s, optional, nullable } = core(schema);
  const def = defOf(s);
  const base = { path, optional, nullable };
  switch (def.type) {
    case 'string':
      return [{ ...base, kind: 'string', maxLength: lengthLimit(s, 'max_length') }];
    case 'number':
    case 'int':
      return [{ ...base, kind: 'number' }];
    case 'boolean':
      return [{ ...base, kind: 'boolean' }];
    case 'enum':
      return [{ ...base, kind: 'enum' }];
    case 'literal':
      return [{ ...base, kind: 'literal' }];
    case 'array': {
      const items = Array.isArray(example) ? example : [];
      const self: Field = { ...base, kind: 'array', maxLength: lengthLimit(s, 'max_length'), element: items[0] };
      return [self, ...(items.length ? fieldsOf(def.element as z.ZodType, items[0], [...path, '0']) : [])];
    }
    case 'object': {
      const shape = def.shape as Record<string, z.ZodType>;
      const catchall = def.catchall as z.ZodType | undefined;
      const self: Field = { ...base, kind: 'object', strict: catchall !== undefined && defOf(catchall).type === 'never' };
      const value = (example && typeof example === 'object' ? example : {}) as Record<string, unknown>;
      // A key the example leaves out is a field of its own, but nothing inside it is reached.
      return [self, ...Object.entries(shape).flatMap(([key, field]) => fieldsOf(field, value[key], [...path, key]).slice(0, value[key] === undefined ? 1 : undefined))];
    }
    case 'union': {
      // The option the example is made of, else the first.
      const options = def.options as z.ZodType[];
      const option = options.find((o) => accepts(o, example)) ?? options[0]!;
      return fieldsOf(option, example, path).map((f, i) => (i === 0 ? { ...f, optional, nullable: f.nullable || nullable } : f));
    }
    default:
      return [{ ...base, kind: 'other' }];
  }
}

// ---- hostile values ----

const DEEP = (() => {
  let v: unknown = 'bottom';
  for (let i = 0; i < 60; i++) v = i % 2 ? [v] : { a: v };
  return v;
})();
/** Values of every JSON type and a few traps; each field keeps those its schema refuses. */
const JUNK: Array<[string, unknown]> = [
  ['null', null],
  ['true', true],
  ['zero', 0],
  ['a negative number', -1],
  ['a number', 12345],
  ['text', 'some text'],
  ['an empty list', []],
  ['a list of junk', [null, {}, 'x']],
  ['an empty object', {}],
  ['an object of junk', { $gt: '', __proto__x: 1 }],
  ['nesting 60 deep', DEEP],
];

export const TEXT_TRAPS: Array<[string, string]> = [
  ['a NUL byte', 'before\u0000after'],
  ['half of an emoji (high surrogate)', 'car \uD83D'],
  ['half of an emoji (low surrogate)', '\uDE97 car'],
  ['a control character', 'bell\u0007'],
  ['DEL and a C1 control', 'x\u007F\u0085'],
  ['only spaces', '   '],
  ['NaN as text', 'NaN'],
  ['Infinity as text', 'Infinity'],
  ['a huge number as text', '1e309'],
  ['a negative id as text', '-1'],
];

const NUMBER_TRAPS: Array<[string, unknown]> = [
  ['NaN as text', 'NaN'],
  ['Infinity as text', 'Infinity'],
  ['-Infinity as text', '-Infinity'],
  ['1e999 (Infinity once parsed)', RAW_INFINITY],
  ['a number as text', '12'],
  ['-1', -1],
  ['0', 0],
  ['a fraction', 1.5],
  ['2^31 (past a PostgreSQL integer)', 2_147_483_648],
  ['2^53 + 2 (past exact integers)', 2 ** 53 + 2],
  ['1e308', 1e308],
  ['-1e308', -1e308],
  ['a tiny fraction', 5e-324],
];

/**
 * Values a schema may let through but PostgreSQL cannot take in the column behind them: a whole
 * number past an `integer` column, or below it. Sent when the schema accepts them; the server must
 * still refuse them in words, never with a 500 from the database.
 */
export const DATABASE_TRAPS: Record<'number' | 'string', Array<[string, unknown]>> = {
  number: [
    ['2^31, one past a PostgreSQL integer', 2_147_483_648],
    ['-2^31 - 1, one below a PostgreSQL integer', -2_147_483_649],
  ],
  // Text no PostgreSQL text or JSONB column stores: the one text rule refuses it, so only a field outside the rule gets here.
  string: [
    ['a NUL byte', 'a\u0000b'],
    ['half of an emoji', 'a\uD83Db'],
  ],
};

/** The fields of the example changed to a value the schema accepts and the database cannot store. */
export function databaseTrapBodies(schema: z.ZodType, example: unknown, shape: z.ZodType = schema): HostileBody[] {
  const bodies: HostileBody[] = [];
  for (const field of fieldsOf(shape, example)) {
    if (field.kind !== 'number' && field.kind !== 'string') continue;
    for (const [what, value] of DATABASE_TRAPS[field.kind]) bodies.push({ label: `${field.path.join('.')}: ${what}`, body: withValue(example, field.path, value), path: field.path });
  }
  return bodies.filter((b) => refusedFields(schema, b.body) === null);
}

/** The hostile values for one field, labelled; the caller keeps those its schema refuses. */
export function hostileValues(field: Field): Array<[string, unknown]> {
  const own: Array<[string, unknown]> = [];
  if (field.kind === 'string') {
    own.push(...TEXT_TRAPS);
    const max = field.maxLength ?? 100_000;
    own.push([`${max + 1} characters (one over its limit)`, 'x'.repeat(max + 1)]);
    if (field.maxLength === undefined) own.push(['100,001 characters', 'x'.repeat(100_001)]);
  }
  if (field.kind === 'number') own.push(...NUMBER_TRAPS);
  if (field.kind === 'enum' || field.kind === 'literal') own.push(['a word not on the list', 'not-a-choice'], ['an empty choice', ''], ['a choice with NUL', 'a\u0000']);
  if (field.kind === 'boolean') own.push(['"true" as text', 'true'], ['1 for true', 1]);
  if (field.kind === 'array') {
    if (field.maxLength !== undefined) own.push([`${field.maxLength + 1} items (one over its limit)`, Array.from({ length: field.maxLength + 1 }, () => field.element ?? 'x')]);
    own.push(['an object where a list goes', { 0: field.element ?? 'x' }], ['a list of junk', [DEEP, null, 'x\u0000']]);
  }
  if (field.kind === 'object' && field.strict) own.push(['an unknown key', { __unknown: true }]);
  return [...own, ...JUNK];
}

// ---- bodies ----

/** A body to send, and the field it changed (`paths`: each field, when it changed several). */
export type HostileBody = { label: string; body: unknown; path: string[]; paths?: string[][] };

/** A copy of `base` with `value` at `path` (`undefined` removes the key); the body itself when the path is empty. */
export function withValue(base: unknown, path: string[], value: unknown): unknown {
  if (path.length === 0) return value;
  const copy = structuredClone(base) as Record<string, unknown>;
  let at = copy;
  for (const key of path.slice(0, -1)) at = at[key] as Record<string, unknown>;
  const last = path[path.length - 1]!;
  if (value === undefined) delete at[last];
  else at[last] = value;
  return copy;
}

/**
 * One field of the valid example changed to one hostile value, or left out: the bodies the schema
 * refuses. `shape` is the schema whose fields are walked, when the route's own reads unknown input.
 */
export function nearValidBodies(schema: z.ZodType, example: unknown, shape: z.ZodType = schema): HostileBody[] {
  const bodies: HostileBody[] = [];
  for (const field of fieldsOf(shape, example)) {
    const at = field.path.join('.') || '(the body)';
    if (field.path.length && !field.optional) bodies.push({ label: `${at} left out`, body: withValue(example, field.path, undefined), path: field.path });
    for (const [what, value] of hostileValues(field)) {
      const body = field.kind === 'object' && what === 'an unknown key' ? withValue(example, field.path, { ...(valueAt(example, field.path) as object), __unknown: true }) : withValue(example, field.path, value);
      bodies.push({ label: `${at}: ${what}`, body, path: field.path });
    }
  }
  return bodies.filter((b) => refusedFields(schema, b.body) !== null);
}

const valueAt = (value: unknown, path: string[]) => path.reduce<unknown>((v, k) => (v as Record<string, unknown> | undefined)?.[k], value);

/** Text with any UTF-16 code unit in it: lone surrogates, NUL and the other controls included. */
const anyCodeUnits = fc.string({ unit: fc.integer({ min: 0, max: 0xffff }).map((c) => String.fromCharCode(c)), maxLength: 40 });

/** Junk of any JSON shape, its text made of any code units. */
const jsonJunk: fc.Arbitrary<unknown> = fc.letrec<{ v: unknown }>((tie) => ({
  v: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    anyCodeUnits,
    fc.double(),
    fc.integer(),
    fc.boolean(),
    fc.constant(null),
    fc.constant(RAW_INFINITY),
    fc.array(tie('v'), { maxLength: 4 }),
    fc.dictionary(anyCodeUnits, tie('v'), { maxKeys: 4 }),
  ),
})).v;

/**
 * fast-check's bodies for a route: one to three fields of the valid example changed (to a hostile value
 * for that kind of field, or to generated junk), or a whole body of junk. Only bodies the schema refuses.
 */
export function hostileBodyArbitrary(schema: z.ZodType, example: unknown, shape: z.ZodType = schema): fc.Arbitrary<HostileBody> {
  const fields = fieldsOf(shape, example);
  const change = fc.constantFrom(...fields).chain((field) =>
    fc.oneof(
      fc.constantFrom(...hostileValues(field)).map(([what, value]) => ({ field, what, value })),
      jsonJunk.map((value) => ({ field, what: 'generated junk', value })),
      fc.constant({ field, what: 'left out', value: undefined as unknown }),
    ),
  );
  const mutated = fc.array(change, { minLength: 1, maxLength: 3 }).map((changes) => {
    // Deepest first, so a change to a field's container replaces what was changed inside it.
    const ordered = [...changes].sort((a, b) => b.field.path.length - a.field.path.length);
    let body = example;
    for (const c of ordered) if (c.field.path.length || c.value !== undefined) body = withValue(body, c.field.path, c.value);
    return { label: ordered.map((c) => `${c.field.path.join('.') || '(the body)'}: ${c.what}`).join('; '), body, path: ordered[0]!.field.path, paths: ordered.map((c) => c.field.path) };
  });
  const whole = jsonJunk.map((body) => ({ label: 'a body of generated junk', body, path: [] as string[] }));
  return fc.oneof({ weight: 4, arbitrary: mutated }, { weight: 1, arbitrary: whole }).filter((b) => b.body !== undefined && refusedFields(schema, b.body) !== null);
}

/** Do two dotted paths name the same field or one inside the other? */
export const related = (a: string, b: string) => a === b || a === '_' || b === '_' || a.startsWith(`${b}.`) || b.startsWith(`${a}.`) || a === '' || b === '';
