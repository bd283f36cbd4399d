import { expect } from 'vitest';
import fc from 'fast-check';
import type { z } from 'zod';
import { ErrorResponseSchema } from '@shared/errors';
import { routeInputSchemas } from '@server/middlewares/validate';
import { testApp } from './api-client';
import { listenApp } from './raw-http';
import { caller, rawRequest, type Caller, type RawAnswer } from './hostile-client';
import { CALLERS, createWorld, type Stage, type World } from './hostile-world';
import { ROUTE_TARGETS, type Group, type RouteTarget } from './hostile-routes';
import { writeRoutes, fillPath, type AppRoute } from './write-routes';
import { asReceived, databaseTrapBodies, exampleOf, hostileBodyArbitrary, jsonText, nearValidBodies, refusedFields, related, fieldsOf, TEXT_TRAPS, type HostileBody } from './hostile-input';

// Sends every write route of a group its hostile input, as a caller allowed to use it, and checks the
// answers and that this world's rows are as they were. The schemas come from the routes themselves:
// each route is first called once in a throwaway world (valid ids, a list for a body), and what its
// parse helpers noted (`routeInputSchemas` in server/middlewares/validate.ts) is its own schema.

/** Fast-check runs per route (per path variant), on top of the fixed cases. */
const NUM_RUNS = 8;
/** Near-valid bodies sent per route (per path variant), taken field by field in turn. */
const NEAR_VALID_CAP = 12;
/** Values the schema takes and a column cannot, sent per route (per path variant), spread over its fields. */
const DATABASE_TRAP_CAP = 8;

/** Wrong spellings of a path id: the first id of a route gets them all, a second id the first two (the ids share IdSchema). */
const BAD_IDS = ['-1', '2147483648', '%00', '0x1F', ' 1.5'];
const BAD_WORDS = ['not-a-choice', '%00', '%ED%A0%80', 'x'.repeat(3000), '%'];
const MEGABYTE_AND_A_BIT = `{"x":"${'x'.repeat(1_100_000)}"}`;

type Case = {
  label: string;
  path: string;
  headers?: Record<string, string>;
  body?: string | Buffer;
  check: (answer: RawAnswer) => void;
};

export type Tally = { routes: number; variants: number; cases: number };

/** The CPU time this process spent since `start` (the app and the client both run in it), in seconds. */
export const cpuSecondsSince = (start: NodeJS.CpuUsage) => {
  const used = process.cpuUsage(start);
  return (used.user + used.system) / 1e6;
};

export async function hostileSetup(stage: Stage = 'registration') {
  const cpuAtStart = process.cpuUsage();
  const server = await listenApp();
  const [world, scratch] = await Promise.all([createWorld(server.baseUrl, stage), createWorld(server.baseUrl, stage)]);
  const tally: Tally = { routes: 0, variants: 0, cases: 0 };
  let turn = 0;
  const callerFor = (w: World, target: RouteTarget): Caller => (target.as === 'rotate' ? w.callers[CALLERS[turn++ % CALLERS.length]!] : w.callers[target.as]);
  const send = (w: World, route: AppRoute, target: RouteTarget, c: Omit<Case, 'check'>) =>
    rawRequest(server.baseUrl, { method: route.method, path: c.path, caller: callerFor(w, target), headers: c.headers, body: c.body });

  /** The route's own schemas for one set of path values, from one call in the throwaway world. */
  async function discover(route: AppRoute, target: RouteTarget, params: Record<string, string | number>, scratchParams: Record<string, string | number>) {
    routeInputSchemas.delete(route.key);
    const path = fillPath(route.path, scratchParams);
    // A fresh visitor each time: the throwaway world's calls really happen, signing out included.
    if (target.as === 'anonymous') scratch.callers.anonymous = await caller(server.baseUrl, 'anonymous');
    const probe = target.page
      ? { label: 'probe', path, headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: 'nothing=here' }
      : { label: 'probe', path, headers: { 'content-type': 'application/json' }, body: '[]' };
    const answer = await send(scratch, route, target, probe);
    expect(answer.status, `${route.key} in the throwaway world: ${answer.text.slice(0, 300)}`).toBeLessThan(500);
    // Turned away before reading its input, the route would teach nothing: its caller or ids are wrong.
    if (!target.page) expect([401, 403], `${route.key} in the throwaway world: ${answer.status} ${answer.text.slice(0, 300)}: check its row in hostile-routes.ts`).not.toContain(answer.status);
    return { schemas: routeInputSchemas.get(route.key) ?? {}, path: fillPath(route.path, params) };
  }

  async function attack(route: AppRoute) {
    const target = ROUTE_TARGETS[route.key];
    if (!target) throw new Error(`${route.key} has no row in tests/support/hostile-routes.ts`);
    tally.routes++;
    const given = target.params?.(world) ?? {};
    const scratchGiven = target.params?.(scratch) ?? {};
    const variants = Array.isArray(given) ? given : [given];
    const scratchVariants = Array.isArray(scratchGiven) ? scratchGiven : [scratchGiven];
    for (const [i, params] of variants.entries()) {
      tally.variants++;
      const { schemas, path } = await discover(route, target, params, scratchVariants[i]!);
      const named = `${route.key} (${path})`;
      if (target.noSchema) expect(schemas, `${named} parses input now: take "noSchema" off its row`).toEqual({});
      else expect(Object.keys(schemas), `${named} parses no input with a zod schema: read it with parseParams/parseBody (or readForm on a page)`).not.toEqual([]);
      const cases = casesFor(route, target, i, path, params, schemas.body, schemas.params);
      let t0 = performance.now();
      const before = await world.checksum();
      const tc = performance.now() - t0;
      t0 = performance.now();
      for (const c of cases) {
        const t1 = performance.now();
        const answer = await send(world, route, target, c);
        if (process.env.HOSTILE_TIMES) console.log('  ', (performance.now() - t1).toFixed(1), 'ms', answer.status, c.label.slice(0, 60));
        tally.cases++;
        expectRefused(named, c.label, answer, target);
        c.check(answer);
      }
      if (schemas.body && !target.page) await databaseTraps(route, target, named, schemas.body, scratchVariants[i]!);
      if (schemas.body && !target.page) {
        const body = schemas.body;
        const example = exampleFor(route, target, body);
        await fc.assert(
          fc.asyncProperty(hostileBodyArbitrary(body, example, target.fields ?? body), async (hostile) => {
            const answer = await send(world, route, target, jsonCase(path, hostile));
            tally.cases++;
            expectRefused(named, hostile.label, answer, target);
            expectFieldsNamed(named, hostile, answer, body);
          }),
          { numRuns: i === 0 ? NUM_RUNS : NUM_RUNS / 2 },
        );
      }
      if (process.env.HOSTILE_TIMES) console.log(named, 'checksum', tc.toFixed(0), 'ms', cases.length, 'cases +', NUM_RUNS, 'runs', (performance.now() - t0).toFixed(0), 'ms');
      expect(await world.checksum(), `${named}: a refused request changed a row of the world`).toEqual(before);
    }
  }

  /**
   * Numbers the schema lets through that no integer column holds, sent in the throwaway world (the
   * route may take them, for a field it ignores): never a 5xx, and a refusal changes nothing.
   */
  async function databaseTraps(route: AppRoute, target: RouteTarget, named: string, body: z.ZodType, scratchParams: Record<string, string | number>) {
    const example = target.valid?.(scratch) ?? exampleOf(target.fields ?? body, scratch.tag);
    if (example === undefined || refusedFields(body, example)) return;
    let before = await scratch.checksum();
    for (const hostile of spread(databaseTrapBodies(body, example, target.fields ?? body), DATABASE_TRAP_CAP)) {
      const answer = await send(scratch, route, target, jsonCase(fillPath(route.path, scratchParams), hostile));
      tally.cases++;
      const what = `${named} — ${hostile.label}: ${answer.status} ${answer.text.slice(0, 300)}`;
      expect(answer.status, what).toBeLessThan(500);
      const after = await scratch.checksum();
      if (answer.status >= 400) {
        expect(ErrorResponseSchema.safeParse(answer.json).success, `${what}: not the error shape`).toBe(true);
        expect(after, `${what}: refused, yet a row changed`).toEqual(before);
      }
      before = after;
    }
  }

  function exampleFor(route: AppRoute, target: RouteTarget, body: z.ZodType): unknown {
    const example = target.valid?.(world) ?? exampleOf(target.fields ?? body, world.tag);
    expect(example, `${route.key}: no valid example from its schema; give one as "valid" in hostile-routes.ts`).toBeDefined();
    expect(refusedFields(body, example), `${route.key}: no valid example from its schema; give one as "valid" in hostile-routes.ts`).toBeNull();
    return example;
  }

  function casesFor(route: AppRoute, target: RouteTarget, variantIndex: number, path: string, params: Record<string, string | number>, body: z.ZodType | undefined, paramsSchema: z.ZodType | undefined): Case[] {
    const cases: Case[] = [];
    const example = body && !target.page ? exampleFor(route, target, body) : undefined;
    const exampleBody = example === undefined ? {} : { headers: { 'content-type': 'application/json' }, body: jsonText(example) };
    const status = (expected: number | number[], code?: string) => (a: RawAnswer) => {
      expect([expected].flat(), `${route.key}: answered ${a.status} ${a.text.slice(0, 300)}`).toContain(a.status);
      if (code && !target.page) expect((a.json as { error: { code: string } }).error.code).toBe(code);
    };

    // Path values of the wrong spelling, or well-formed and naming nothing.
    const firstVariant = variantIndex === 0;
    for (const [n, name] of Object.keys(params).entries()) {
      if (!firstVariant) break;
      const bad = typeof params[name] === 'number' ? [...(n === 0 ? BAD_IDS : BAD_IDS.slice(0, 2)), String(world.ids.nothing)] : BAD_WORDS;
      for (const value of bad) {
        const raw = route.path.replace(/:(\w+)/g, (_m, n: string) => (n === name ? value.replace(/ /g, '%20') : encodeURIComponent(String(params[n]))));
        cases.push({
          label: `:${name} = ${JSON.stringify(value.slice(0, 30))}`,
          path: raw,
          ...exampleBody,
          check: (a) => {
            expect(a.status, `${route.key} :${name}=${value.slice(0, 30)}: ${a.text.slice(0, 300)}`).toBeGreaterThanOrEqual(400);
            const fields = (a.json as { error?: { code: string; fields?: Record<string, string> } } | undefined)?.error;
            if (fields?.code === 'VALIDATION_FAILED' && paramsSchema) expect(Object.keys(fields.fields ?? {}), `${route.key} :${name}=${value.slice(0, 30)}`).toContain(name);
          },
        });
      }
    }

    if (target.page) return [...cases, ...pageCases(path, body)];

    // Bodies no JSON parser reads, or sent as something else than JSON: refused before any route
    // (a route that reads its own raw bytes refuses them its own way).
    if (target.rawBody) {
      const any4xx = (a: RawAnswer) => expect(a.status).toBeGreaterThanOrEqual(400);
      return [...cases, ...['{"id": "evt_1", "type": "checkout.session.completed"}', '\u0000\uffff', '', MEGABYTE_AND_A_BIT].map((text, i) => ({ label: `raw bytes ${i + 1}`, path, headers: { 'content-type': i % 2 ? 'text/plain' : 'application/json' }, body: text, check: any4xx }))];
    }
    cases.push(
      { label: 'not JSON', path, headers: { 'content-type': 'application/json' }, body: '{"title": "unfinished', check: status(400, 'BAD_REQUEST') },
      { label: 'NaN as a bare JSON value', path, headers: { 'content-type': 'application/json' }, body: '{"x": NaN}', check: status(400, 'BAD_REQUEST') },
      { label: 'a form', path, headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: 'title=x', check: status(415, 'UNSUPPORTED_MEDIA_TYPE') },
      { label: 'JSON in a charset we do not read', path, headers: { 'content-type': 'application/json; charset=latin1' }, body: '{}', check: status(415, 'UNSUPPORTED_MEDIA_TYPE') },
      { label: 'over a megabyte', path, headers: { 'content-type': 'application/json' }, body: MEGABYTE_AND_A_BIT, check: status(413, 'PAYLOAD_TOO_LARGE') },
    );
    if (target.multipart) cases.push(...multipartCases(path, target.multipart));
    if (!body) return cases;

    cases.push({ label: 'an empty body', path, headers: { 'content-type': 'application/json' }, body: '', check: status(400, 'BAD_REQUEST') });
    const structural: HostileBody[] = [
      { label: 'a list where an object goes', body: [example], path: [] },
      { label: 'an empty object', body: {}, path: [] },
      { label: '__proto__ and constructor keys', body: JSON.parse(`{"__proto__": {"isSiteAdmin": true}, "constructor": {"prototype": {"x": 1}}}`), path: [] },
    ];
    const near = roundRobin(nearValidBodies(body, example, target.fields ?? body), variantIndex === 0 ? NEAR_VALID_CAP : NEAR_VALID_CAP / 2);
    for (const hostile of [...structural, ...near].filter((b) => refusedFields(body, b.body) !== null)) {
      cases.push({ ...jsonCase(path, hostile), check: (a) => expectFieldsNamed(route.key, hostile, a, body) });
    }
    return cases;
  }

  function pageCases(path: string, body: z.ZodType | undefined): Case[] {
    const refusedPage = (a: RawAnswer) => expect(a.contentType).toContain('text/html');
    const form = (fields: Record<string, string>) => ({ headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: new URLSearchParams(fields).toString() });
    const cases: Case[] = [
      { label: 'JSON to a form', path, headers: { 'content-type': 'application/json' }, body: '{"question":"x"}', check: refusedPage },
      { label: 'a form of 20 kB', path, ...form({ question: 'x'.repeat(20_000) }), check: refusedPage },
      { label: 'an empty form', path, ...form({}), check: refusedPage },
    ];
    if (body) {
      const valid = (exampleOf(body, world.tag) ?? {}) as Record<string, string>;
      for (const field of fieldsOf(body, valid).filter((f) => f.kind === 'string' && f.path.length === 1)) {
        for (const [what, value] of [...TEXT_TRAPS, ['over its limit', 'x'.repeat((field.maxLength ?? 4000) + 1)] as [string, string]]) {
          const sent = form({ ...valid, [field.path[0]!]: value });
          // As the server reads it: a form cannot carry half an emoji, the browser's encoding makes it U+FFFD.
          if (body.safeParse(Object.fromEntries(new URLSearchParams(sent.body))).success) continue;
          cases.push({ label: `${field.path[0]}: ${what}`, path, ...sent, check: refusedPage });
        }
      }
    }
    return cases;
  }

  return {
    world,
    tally,
    cpuAtStart,
    attack,
    close: () => server.close(),
  };
}

/** The write routes of a group, read from the app's router. */
export const writeRoutesOf = (group: Group) => writeRoutes(testApp()).filter((r) => ROUTE_TARGETS[r.key]?.group === group);

function jsonCase(path: string, hostile: HostileBody): Omit<Case, 'check'> {
  return { label: hostile.label, path, headers: { 'content-type': 'application/json' }, body: jsonText(hostile.body) };
}

/** A 4xx in the product's error shape (a page answers in HTML), never a 5xx. */
function expectRefused(route: string, label: string, answer: RawAnswer, target: RouteTarget) {
  const what = `${route} — ${label}: ${answer.status} ${answer.text.slice(0, 400)}`;
  expect(answer.status, what).toBeGreaterThanOrEqual(400);
  expect(answer.status, what).toBeLessThan(500);
  if (target.page) return;
  expect(ErrorResponseSchema.safeParse(answer.json).success, `${what}: not the error shape`).toBe(true);
}

/** A body the schema refuses: 400 naming the fields the schema names, the changed field among them. */
function expectFieldsNamed(route: string, hostile: HostileBody, answer: RawAnswer, schema: z.ZodType) {
  const what = `${route} — ${hostile.label} ${JSON.stringify(jsonText(hostile.body).slice(0, 300))}: ${answer.status} ${answer.text.slice(0, 400)}`;
  expect(answer.status, what).toBe(400);
  const received = asReceived(hostile.body);
  if (typeof received !== 'object' || received === null) {
    // A bare string, number, true or null: the JSON parser takes only objects and lists.
    expect((answer.json as { error: { code: string } }).error.code, what).toBe('BAD_REQUEST');
    return;
  }
  const error = (answer.json as { error: { code: string; fields?: Record<string, string> } }).error;
  expect(error.code, what).toBe('VALIDATION_FAILED');
  const schemaFields = refusedFields(schema, hostile.body);
  expect(error.fields, what).toEqual(schemaFields);
  const changed = (hostile.paths ?? [hostile.path]).map((p) => p.join('.'));
  // Leaving out an optional field can make others required (no dyno curve: then its peaks): the schema names those, as the server did.
  if (!Object.keys(schemaFields ?? {}).some((f) => changed.some((at) => related(f, at)))) return;
  expect(Object.keys(error.fields ?? {}).some((f) => changed.some((at) => related(f, at))), `${what}: ${changed.join(' or ') || 'the body'} is not named`).toBe(true);
}

/** Up to `cap` of a list, spread evenly over it. */
function spread<T>(list: T[], cap: number): T[] {
  if (list.length <= cap) return list;
  return Array.from({ length: cap }, (_, i) => list[Math.floor((i * list.length) / cap)]!);
}

/** Up to `cap` bodies, one field at a time in turn, so every field gets its share before any gets a second. */
function roundRobin(bodies: HostileBody[], cap: number): HostileBody[] {
  const byField = new Map<string, HostileBody[]>();
  for (const b of bodies) byField.set(b.path.join('.'), [...(byField.get(b.path.join('.')) ?? []), b]);
  const queues = [...byField.values()];
  const out: HostileBody[] = [];
  for (let round = 0; out.length < cap && queues.some((q) => q.length > round); round++) {
    for (const q of queues) if (q[round] && out.length < cap) out.push(q[round]!);
  }
  return out;
}

const BOUNDARY = '----hostile-boundary';
function multipartCases(path: string, fileField: string): Case[] {
  const part = (name: string, value: string, file?: string) =>
    `--${BOUNDARY}\r\nContent-Disposition: form-data; name="${name}"${file ? `; filename="${file}"\r\nContent-Type: image/jpeg` : ''}\r\n\r\n${value}\r\n`;
  const headers = { 'content-type': `multipart/form-data; boundary=${BOUNDARY}` };
  const refused = (a: RawAnswer) => expect(a.status).toBe(400);
  return [
    { label: 'multipart: text said to be a JPEG, and a caption with NUL', path, headers, body: part('captions', 'a\u0000b') + part(fileField, 'not an image at all', 'car.jpg') + `--${BOUNDARY}--\r\n`, check: refused },
    { label: 'multipart: the file in another field', path, headers, body: part('elsewhere', 'xx', 'car.jpg') + `--${BOUNDARY}--\r\n`, check: refused },
    { label: 'multipart: cut off mid-part', path, headers, body: `--${BOUNDARY}\r\nContent-Disposition: form-data; name="${fileField}"; filename="a.jpg"\r\n\r\nabc`, check: refused },
    { label: 'multipart: no boundary', path, headers: { 'content-type': 'multipart/form-data' }, body: 'junk', check: refused },
  ];
}
