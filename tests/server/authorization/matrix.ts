import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { testApp } from '../../support/api-client';
import { loopbackAddress } from '../../support/visitor';
import { CALLERS, type Caller, type Fixture } from './fixture';

/**
 * The authorization matrix: who gets which answer from every route. A row names a route and a rule;
 * the rule is a line of the table below, one expected status per caller. `X` is the row's own answer
 * for a caller the rule lets through (200, 201, 204, or the service's 409 when the show's state says no).
 * The statuses are written out here, not computed from the product's policies. The disabled account's
 * session ended when the site admin turned it off, so it is answered as nobody signed in (401).
 */
const X = 0;
const RULES = {
  //                          anon unconf owner bOwn oOwn  org coOrg oOrg judge oCls oShw gate oGate admin disab
  public:                  [    X,    X,    X,    X,   X,    X,   X,   X,    X,   X,   X,   X,   X,    X,    X ],
  signedIn:                [  401,    X,    X,    X,   X,    X,   X,   X,    X,   X,   X,   X,   X,    X,  401 ],
  // Taking part in shows (registering, accepting a role) needs a confirmed address.
  confirmed:               [  401,  403,    X,    X,   X,    X,   X,   X,    X,   X,   X,   X,   X,    X,  401 ],
  // Creating a show: the may-organise flag (organisers of A and B have it) or the site admin.
  mayOrganise:             [  401,  403,  403,  403, 403,    X, 403,   X,  403, 403, 403, 403, 403,    X,  401 ],
  siteAdmin:               [  401,  403,  403,  403, 403,  403, 403, 403,  403, 403, 403, 403, 403,    X,  401 ],
  // A build is its owner's alone: anyone else signed in is told it does not exist, the site admin too.
  buildOwner:              [  401,  404,  404,    X, 404,  404, 404, 404,  404, 404, 404, 404, 404,  404,  401 ],
  // Show A: no role in it reads as no such show (404); a role that may not do this, 403.
  showView:                [  401,  404,  404,  404, 404,    X,   X, 404,    X,   X, 404,   X, 404,  404,  401 ],
  showManage:              [  401,  404,  404,  404, 404,    X,   X, 404,  403, 403, 404, 403, 404,  404,  401 ],
  showCheckIn:             [  401,  404,  404,  404, 404,    X,   X, 404,  403, 403, 404,   X, 404,  404,  401 ],
  showJudge:               [  401,  404,  404,  404, 404,  403, 403, 404,    X,   X, 404, 403, 404,  404,  401 ],
  // Scoring a car of class one: the judge of the other class is refused by the scoring service.
  showJudgeOfClass:        [  401,  404,  404,  404, 404,  403, 403, 404,    X, 403, 404, 403, 404,  404,  401 ],
  // The entry of `buildOwner` in show A: someone neither its owner nor in the show is told it does not exist.
  entryOwnerOrOrganiser:   [  401,  404,  404,    X, 404,    X,   X, 404,  403, 403, 404, 403, 404,  404,  401 ],
  entryOwner:              [  401,  404,  404,    X, 404,  403, 403, 404,  403, 403, 404, 403, 404,  404,  401 ],
  entryOrganiser:          [  401,  404,  404,  403, 404,    X,   X, 404,  403, 403, 404, 403, 404,  404,  401 ],
} satisfies Record<string, number[]>;
export type Rule = keyof typeof RULES;

/** A row's answer for the callers its rule lets through: one status, or one per caller with `else` for the rest. */
type Ok = number | (Partial<Record<Caller, number>> & { else: number });

export type Row = {
  /** "METHOD /path" exactly as the router holds it. */
  route: string;
  rule: Rule;
  ok: Ok;
  /** The path asked (default: the route's path with `:id` filled: the build for `buildOwner`, the entry under /api/entries, else show A). */
  path?: (f: Fixture, who: Caller) => string;
  body?: (f: Fixture, who: Caller) => object;
  /** Send the body as a raw string (the payment webhook). */
  raw?: boolean;
  /** Run this row's allowed cells after every other row of its file (it signs out, or gives someone a role). */
  last?: boolean;
  /** Signs the caller out: after every other row of its file, the `last` ones too. */
  signsOut?: boolean;
  /**
   * Limited per address (the visitors' forms, confirming a reset or an address): each caller sends from a
   * loopback address of its own to a listening app, with its own cookies, so neither the limit of one caller
   * nor other test files' requests from 127.0.0.1 answer for the next.
   */
  ownAddress?: boolean;
  /** Why the row's answers are what they are, where the table alone does not say. */
  note?: string;
};

/**
 * A request by a caller allowed on the route's show or build, carrying the id of another show's or
 * another owner's record in its path, body, list or query: it must be refused, and change nothing.
 */
export type ForeignCell = {
  route: string;
  as: Caller;
  why: string;
  status: number;
  path: (f: Fixture) => string;
  body?: (f: Fixture) => object;
  /** What else the answer must show (a lookup that answers 200 but names nothing of the other show). */
  check?: (body: unknown) => void | Promise<void>;
};

export const expected = (row: Row, who: Caller): number => {
  const status = RULES[row.rule][CALLERS.indexOf(who)]!;
  if (status !== X) return status;
  return typeof row.ok === 'number' ? row.ok : (row.ok[who] ?? row.ok.else);
};
export const isRefusal = (status: number) => status === 401 || status === 403 || status === 404;
export const ruleSize = () => ({ rules: Object.keys(RULES).length, columns: CALLERS.length });

/** The path with every `:param` filled from the fixture: the route's own show, build or entry by default. */
export function defaultPath(route: string, rule: Rule, f: Fixture): string {
  const path = route.split(' ')[1]!;
  const id = rule === 'buildOwner' ? f.build.id : path.startsWith('/api/entries/') ? f.entry : f.showA.id;
  return path.replace(':id', String(id));
}

type Client = Fixture['clients'][Caller];
type Answer = { status: number; body?: unknown; text?: string };

let listening: { server: http.Server; url: Promise<string> } | undefined;
const listeningUrl = () => {
  if (!listening) {
    const server = http.createServer(testApp());
    listening = { server, url: new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve(`http://127.0.0.1:${(server.address() as AddressInfo).port}`))) };
  }
  return listening.url;
};
export const closeListening = () => new Promise<void>((resolve) => (listening ? listening.server.close(() => resolve()) : resolve()));

/**
 * A request from a loopback address of its own to a listening app, with the caller's cookies: a form post as
 * a browser sends it for the server's pages, JSON with the caller's CSRF token for the API.
 */
async function sendFromOwnAddress(client: Client, method: string, path: string, body?: object): Promise<Answer> {
  const url = await listeningUrl();
  const jar = (client.raw as unknown as { jar: { getCookies(info: object): { toValueString(): string } } }).jar;
  const cookie = jar.getCookies({ domain: '127.0.0.1', path: '/', secure: false, script: false }).toValueString();
  const api = path.startsWith('/api/');
  const payload = api ? JSON.stringify(body ?? {}) : new URLSearchParams(Object.entries(body ?? {}).map(([k, v]) => [k, String(v)])).toString();
  const headers = api ? { cookie, 'content-type': 'application/json', 'x-csrf-token': client.csrf } : { cookie, origin: url, 'content-type': 'application/x-www-form-urlencoded' };
  return new Promise((resolve, reject) => {
    const req = http.request(`${url}${path}`, { method, localAddress: loopbackAddress(), headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, text: Buffer.concat(chunks).toString('utf8').slice(0, 200) }));
    });
    req.on('error', reject);
    req.end(method === 'GET' ? undefined : payload);
  });
}

export async function send(client: Client, method: string, path: string, body?: object, raw?: boolean, ownAddress?: boolean): Promise<Answer> {
  if (ownAddress) return sendFromOwnAddress(client, method, path, body);
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  if (m === 'get') return client.raw.get(path);
  const req = client.raw[m](path).set('X-CSRF-Token', client.csrf);
  if (raw) return req.set('Content-Type', 'application/json').send(JSON.stringify(body ?? {}));
  return body === undefined ? req : req.send(body);
}

/**
 * The rows a refused request must leave as they were, scoped to the fixture's people, builds and shows
 * (other test files write to the same database at the same time): per table its row count and an md5 of
 * every row's text.
 */
export async function snapshot(f: Fixture): Promise<Record<string, string>> {
  const users = Object.values(f.users);
  const events = [f.showA.id, f.showB.id, f.showC.id];
  const builds = `SELECT id FROM builds WHERE owner_id IN (:users)`;
  const tables: Record<string, string> = {
    users: `id IN (:users)`,
    builds: `owner_id IN (:users)`,
    build_sections: `build_id IN (${builds})`,
    dyno_runs: `build_id IN (${builds})`,
    weigh_ins: `build_id IN (${builds})`,
    photos: `build_id IN (${builds})`,
    build_log_posts: `build_id IN (${builds})`,
    build_questions: `build_id IN (${builds})`,
    figure_changes: `build_id IN (${builds})`,
    email_verification_tokens: `user_id IN (:users)`,
    password_reset_tokens: `user_id IN (:users)`,
    events: `id IN (:events)`,
    event_classes: `event_id IN (:events)`,
    criteria: `event_id IN (:events)`,
    entries: `event_id IN (:events)`,
    event_memberships: `event_id IN (:events)`,
    event_invitations: `event_id IN (:events)`,
    judge_assignments: `event_id IN (:events)`,
    scores: `event_id IN (:events)`,
    sheet_notes: `event_id IN (:events)`,
    card_prints: `event_id IN (:events)`,
    manual_tie_breaks: `event_id IN (:events)`,
    published_results: `event_id IN (:events)`,
    votes: `event_id IN (:events)`,
    audit_lines: `event_id IN (:events)`,
  };
  const sql = Object.entries(tables)
    .map(([t, where]) => `SELECT '${t}' AS t, count(*)::text || ':' || coalesce(md5(string_agg(x::text, '|' ORDER BY x::text)), '') AS v FROM ${t} x WHERE ${where}`)
    .join(' UNION ALL ');
  const rows = await sequelize.query<{ t: string; v: string }>(sql, { type: QueryTypes.SELECT, replacements: { users, events } });
  return Object.fromEntries(rows.map((r) => [r.t, r.v]));
}

export type Tally = { routes: number; cells: number; foreign: number; problems: string[] };

const bodyText = (res: Answer) => JSON.stringify(res.body && Object.keys(res.body).length ? res.body : (res.text ?? '')).slice(0, 240);

/** Every refused cell of a row, all callers at once, then the rows checked unchanged. */
async function runRefused(f: Fixture, row: Row, tally: Tally) {
  const [method] = row.route.split(' ');
  const refused = CALLERS.filter((who) => isRefusal(RULES[row.rule][CALLERS.indexOf(who)]!));
  if (!refused.length) return;
  const before = await snapshot(f);
  await Promise.all(
    refused.map(async (who) => {
      const path = row.path ? row.path(f, who) : defaultPath(row.route, row.rule, f);
      const res = await send(f.clients[who], method!, path, row.body?.(f, who), row.raw, row.ownAddress);
      if (res.status !== expected(row, who)) tally.problems.push(`${row.route} as ${who}: expected ${expected(row, who)}, got ${res.status} ${bodyText(res)}`);
    }),
  );
  tally.cells += refused.length;
  const after = await snapshot(f);
  for (const table of Object.keys(before)) if (before[table] !== after[table]) tally.problems.push(`${row.route}: a refused request changed ${table}`);
}

/** The allowed cells of a row, one caller after another (an allowed write may change what the next one finds). */
async function runAllowed(f: Fixture, row: Row, tally: Tally) {
  const [method] = row.route.split(' ');
  const allowed = CALLERS.filter((who) => !isRefusal(RULES[row.rule][CALLERS.indexOf(who)]!));
  for (const who of allowed) {
    const path = row.path ? row.path(f, who) : defaultPath(row.route, row.rule, f);
    const res = await send(f.clients[who], method!, path, row.body?.(f, who), row.raw, row.ownAddress);
    if (res.status !== expected(row, who)) tally.problems.push(`${row.route} as ${who} (allowed): expected ${expected(row, who)}, got ${res.status} ${bodyText(res)}`);
  }
  tally.cells += allowed.length;
}

async function runForeign(f: Fixture, cell: ForeignCell, tally: Tally) {
  const [method] = cell.route.split(' ');
  const before = await snapshot(f);
  const res = await send(f.clients[cell.as], method!, cell.path(f), cell.body?.(f));
  tally.foreign += 1;
  if (res.status !== cell.status) tally.problems.push(`${cell.route} as ${cell.as}, ${cell.why}: expected ${cell.status}, got ${res.status} ${bodyText(res)}`);
  else if (cell.check) {
    try {
      await cell.check(res.body);
    } catch (err) {
      tally.problems.push(`${cell.route} as ${cell.as}, ${cell.why}: ${(err as Error).message}`);
    }
  }
  const after = await snapshot(f);
  for (const table of Object.keys(before)) if (before[table] !== after[table]) tally.problems.push(`${cell.route} as ${cell.as}, ${cell.why}: changed ${table}`);
}

/**
 * Runs a file's rows: every refused cell first (nothing has changed yet), then the foreign ids, then the
 * allowed cells in the rows' order, `last` rows at the end. Collects every wrong cell, so one run lists them all.
 */
export async function runMatrix(f: Fixture, rows: Row[], foreign: ForeignCell[]): Promise<Tally> {
  const tally: Tally = { routes: rows.length, cells: 0, foreign: 0, problems: [] };
  for (const row of rows) await runRefused(f, row, tally);
  for (const cell of foreign) await runForeign(f, cell, tally);
  const order = (r: Row) => (r.signsOut ? 2 : r.last ? 1 : 0);
  for (const row of [...rows].sort((x, y) => order(x) - order(y))) await runAllowed(f, row, tally);
  return tally;
}
