// The page the server sends for every app address (the built client's index.html), with what that address's
// screen needs named in it, so a phone on one bar of signal fetches it all at once instead of one thing after
// another: the screen's own chunks as modulepreloads beside the entry, and the screen's first API answer as a
// fetch preload. For the judges' and the gate's addresses it also lists every chunk of their screens (static
// and dynamic imports alike), which their service workers keep so the screens reopen with no signal.
// Nothing in it depends on who asks: no session, no personal data, so it is cached like the file (`no-cache`).
import { existsSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { logger } from './logger';
import { EARLY_SCRIPT, OPENING } from './first-screens/early-script';

export const CLIENT_DIST = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../dist/client');

/** What the app layout and every signed-in screen read first (`client/src/features/session/api/get-session.ts`). */
const SESSION = '/api/session';

/** The lazy screens of `client/src/app/router.tsx`, by their source path (the build manifest's keys). */
export const SCREEN_MODULES = {
  signIn: 'src/features/session/components/sign-in-page.tsx',
  judgeLayout: 'src/features/judging/components/judge-layout.tsx',
  judgeHome: 'src/features/judging/components/judge-home-page.tsx',
  judgeCars: 'src/features/judging/components/judge-cars-page.tsx',
  scoreSheet: 'src/features/judging/components/score-sheet-page.tsx',
  gate: 'src/features/show-day/components/gate-page.tsx',
} as const;

type Screen = {
  path: RegExp;
  /** The router's lazy modules this address renders: preloaded with their static imports. */
  modules: string[];
  /** The first API answer the screen reads, from the address's id when it has one. */
  data?: (id: string | undefined) => string;
  /** The area whose service worker keeps this page: every chunk of `OFFLINE_AREAS[area]` is listed in it. */
  offline?: keyof typeof OFFLINE_AREAS;
};

/** Each worker's screens: the chunks the judge-sw.js and gate-sw.js keep come from these (and what they import). */
export const OFFLINE_AREAS = {
  judge: [SCREEN_MODULES.judgeLayout, SCREEN_MODULES.judgeHome, SCREEN_MODULES.judgeCars, SCREEN_MODULES.scoreSheet],
  gate: [SCREEN_MODULES.gate],
};

/** App addresses opened cold (from a link, a bookmark, a reload), in the router's order; keep in step with router.tsx. */
export const CLIENT_SCREENS: Screen[] = [
  { path: /^\/sign-in\/?$/, modules: [SCREEN_MODULES.signIn], data: () => SESSION },
  { path: /^\/judge\/?$/, modules: [SCREEN_MODULES.judgeLayout, SCREEN_MODULES.judgeHome], data: () => SESSION, offline: 'judge' },
  { path: /^\/judge\/(\d{1,15})\/?$/, modules: [SCREEN_MODULES.judgeLayout, SCREEN_MODULES.judgeCars], data: (id) => `/api/events/${id!}/judging/mine`, offline: 'judge' },
  { path: /^\/judge\/(\d{1,15})\/cars\/\d{1,15}\/?$/, modules: [SCREEN_MODULES.judgeLayout, SCREEN_MODULES.scoreSheet], data: (id) => `/api/events/${id!}/judging/mine`, offline: 'judge' },
  { path: /^\/judge\//, modules: [SCREEN_MODULES.judgeLayout], offline: 'judge' },
  { path: /^\/gate\/(\d{1,15})\/?$/, modules: [SCREEN_MODULES.gate], data: (id) => `/api/events/${id!}`, offline: 'gate' },
  // The gate's worker keeps the page at /gate: it needs the gate's chunks named too.
  { path: /^\/gate(\/|$)/, modules: [SCREEN_MODULES.gate], offline: 'gate' },
];

type ManifestChunk = { file: string; isEntry?: boolean; imports?: string[]; dynamicImports?: string[]; css?: string[] };
type Manifest = Record<string, ManifestChunk>;

/**
 * The files a chunk needs at once (it and its static imports), or with `dynamic` everything it may load later
 * too: its own dynamic imports, though not the entry's (every other screen of the app).
 */
export function chunkFiles(manifest: Manifest, keys: string[], { dynamic = false } = {}): string[] {
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    const chunk = manifest[key];
    if (!chunk) throw new Error(`The client build's manifest has no ${key}: did a screen move? (server/client-shell.ts)`);
    seen.add(key);
    for (const next of chunk.imports ?? []) visit(next);
    if (dynamic && !chunk.isEntry) for (const next of chunk.dynamicImports ?? []) visit(next);
  };
  keys.forEach(visit);
  return [...seen].flatMap((k) => [manifest[k]!.file, ...(manifest[k]!.css ?? [])]).map((f) => `/${f}`);
}

type Built = { mtimeMs: number; html: string; manifest: Manifest };
let built: Built | undefined;

/** index.html and the manifest as last built (read again when a build replaced them). */
function readBuilt(): Built | null {
  const index = path.join(CLIENT_DIST, 'index.html');
  if (!existsSync(index)) return null;
  const { mtimeMs } = statSync(index);
  if (built?.mtimeMs !== mtimeMs) {
    const manifestFile = path.join(CLIENT_DIST, '.vite/manifest.json');
    built = { mtimeMs, html: readFileSync(index, 'utf8'), manifest: existsSync(manifestFile) ? (JSON.parse(readFileSync(manifestFile, 'utf8')) as Manifest) : {} };
  }
  return built;
}

/** Only what a path of digits and the chunk names (letters, digits, `-`, `_`, `.`) can hold reaches the page. */
const attr = (url: string) => {
  if (!/^\/[\w./-]+$/.test(url)) throw new Error(`Not a URL for the app's page: ${url}`);
  return url;
};

/**
 * The app's page for `pathname`, with its screen's hints and, when the server drew one (first-screens/), that
 * first screen in place of the opening text with the script that holds its form; null when the client is not built.
 */
export function clientShellHtml(pathname: string, firstScreen?: string): string | null {
  const b = readBuilt();
  if (!b) return null;
  const html = firstScreen ? withFirstScreen(b.html, firstScreen) : b.html;
  try {
    return withHints({ ...b, html }, pathname);
  } catch (err) {
    // A screen moved without this file: the page still works, only slower on one bar (the test names the screen).
    logger.warn({ err }, 'the app page is sent without its screen hints');
    return html;
  }
}

function withFirstScreen(html: string, screen: string): string {
  if (!html.includes(OPENING) || !html.includes('</body>')) throw new Error('The built index.html has no opening text to replace (server/client-shell.ts).');
  // Functions, not strings, as replacements: a show's name may hold `$&`, which a string replacement would expand.
  return html.replace(OPENING, () => screen).replace('</body>', () => `  <script>${EARLY_SCRIPT}</script>\n  </body>`);
}

function withHints(b: Built, pathname: string): string {
  // Any other address renders in the app layout, which asks for the session first: that answer is on its way too.
  const screen = CLIENT_SCREENS.find((s) => s.path.test(pathname)) ?? { path: /./, modules: [], data: () => SESSION };
  if (!b.manifest['index.html']) return b.html;
  const named = new Set([...b.html.matchAll(/(?:src|href)="(\/assets\/[^"]+)"/g)].map((m) => m[1]!));
  const preloads = chunkFiles(b.manifest, screen.modules).filter((f) => !named.has(f) && f.endsWith('.js'));
  const hints = preloads.map((f) => `<link rel="modulepreload" crossorigin href="${attr(f)}">`);
  if (screen.data) hints.push(`<link rel="preload" as="fetch" crossorigin href="${attr(screen.data(screen.path.exec(pathname)?.[1]))}">`);
  if (screen.offline) {
    const kept = chunkFiles(b.manifest, OFFLINE_AREAS[screen.offline], { dynamic: true }).filter((f) => !named.has(f) && !preloads.includes(f));
    // Read by the area's service worker (offline-shell-sw.js keeps every "/assets/…" the page names); not run.
    hints.push(`<script type="application/json" id="placard-offline-assets">${JSON.stringify(kept.map(attr))}</script>`);
  }
  return b.html.replace('</head>', `${hints.map((h) => `    ${h}\n`).join('')}  </head>`);
}
