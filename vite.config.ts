import { defineConfig } from 'vitest/config';
import type { Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';
import { TEST_ENV } from './tests/support/test-env.ts';
import LongestFirstSequencer from './tests/support/longest-first.ts';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

const alias = {
  '@client': here('./client/src'),
  '@server': here('./server'),
  '@shared': here('./shared'),
  '@templates': here('./templates'),
};

/**
 * The test projects (`npm test` runs them all; `npm run test:quick` runs unit and api):
 * - unit: pure code, threads, no database;
 * - api: the real app and the test database, one module graph per worker (no per-file isolation:
 *   every file keeps to rows of its own), so the server is imported once per worker, not per file;
 * - isolated: files that mock a module or point the server elsewhere before importing it;
 * - browser: one server and one Chromium per worker, a fresh browser context per test, after the api group;
 * - slow: database restarts, forked servers and the card-layout corpus, last, with patient limits.
 */
const PURE_SERVER_TESTS = ['tests/server/config.test.ts', 'tests/server/env-example.test.ts', 'tests/server/payments/config.test.ts', 'tests/server/policies/**', 'tests/server/pages/page-contrast.test.ts', 'tests/server/auth/**'];
const ISOLATED_TESTS = ['tests/server/api/password-reset-timing.test.ts', 'tests/server/api/database-wait-bound.test.ts', 'tests/server/api/address-limits.test.ts', 'tests/server/api/health-down.test.ts', 'tests/server/api/readiness.test.ts', 'tests/server/mail/**', 'tests/server/payments/handler-wiring.test.ts'];
const SLOW_TESTS = ['tests/server/resilience/**', 'tests/server/scale/**', 'tests/server/cards/layout-*.test.ts', 'tests/server/results/certificate-layout.test.ts'];
const BROWSER_TESTS = ['tests/e2e/**'];

function testConfig() {
  // Fail fast: a step that hangs fails in seconds, not minutes (the slow project keeps patient limits).
  const quick = { testTimeout: 60_000, hookTimeout: 60_000, expect: { poll: { timeout: 10_000 } } };
  const project = (name: string, options: Record<string, unknown>) => ({ extends: true as const, test: { name, ...quick, ...options } });
  return {
    environment: 'node' as const,
    env: { ...TEST_ENV },
    globalSetup: ['tests/support/global-setup.ts'],
    reporters: ['default', './tests/support/project-times-reporter.ts'],
    // Two cores: two workers, and the browser journeys start only when the API files are done.
    maxWorkers: 2,
    // Isolated and unit files before the api files, the longest file of a project first (tests/support/longest-first.ts).
    sequence: { sequencer: LongestFirstSequencer },
    projects: [
      project('unit', { include: ['tests/shared/**/*.test.ts', 'tests/client/**/*.test.ts', 'tests/lint/**/*.test.ts', ...PURE_SERVER_TESTS.map(glob)], pool: 'threads', isolate: false, sequence: { groupOrder: 0 } }),
      project('api', { include: ['tests/server/**/*.test.ts'], exclude: [...PURE_SERVER_TESTS, ...ISOLATED_TESTS, ...SLOW_TESTS].map(glob), pool: 'forks', isolate: false, sequence: { groupOrder: 0 } }),
      project('isolated', { include: ISOLATED_TESTS.map(glob), pool: 'forks', isolate: true, sequence: { groupOrder: 0 } }),
      // A poll of a screen asks Chromium to find elements by role in the whole page (the editor is 19,000 px long):
      // every 150 ms instead of vitest's 50 ms leaves the two cores to the browsers and the server.
      project('browser', { include: BROWSER_TESTS.map(glob), pool: 'forks', isolate: false, expect: { poll: { timeout: 10_000, interval: 150 } }, sequence: { groupOrder: 1 } }),
      project('slow', { include: SLOW_TESTS.map(glob), pool: 'forks', isolate: false, testTimeout: 300_000, hookTimeout: 180_000, expect: { poll: { timeout: 60_000 } }, sequence: { groupOrder: 2 } }),
    ],
  };
}

/** A folder glob names its test files. */
function glob(pattern: string): string {
  return pattern.endsWith('/**') ? `${pattern}/*.test.ts` : pattern;
}

/**
 * The built index.html preloads the stylesheet instead of linking it: a stylesheet link in the head holds
 * the first paint until the CSS arrives (seconds on one bar of signal), while the page's opening text has
 * its own inline rules. `client/src/main.tsx` applies the stylesheet and renders once it is in.
 */
function stylesheetAfterFirstPaint(): Plugin {
  return {
    name: 'placard-stylesheet-after-first-paint',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(html) {
        const link = /<link rel="stylesheet" crossorigin href="(\/assets\/[^"]+\.css)">/;
        if (!link.test(html)) throw new Error('index.html has no stylesheet link to turn into a preload: has the build changed its markup?');
        return html.replace(link, '<link rel="preload" as="style" crossorigin href="$1">');
      },
    },
  };
}

// One file configures the client build, the dev server and the tests.
// The client lives in client/ (its index.html is the entry); tests run from the project root.
export default defineConfig(({ mode }) => {
  if (mode === 'test') return { resolve: { alias }, test: testConfig() };
  const apiTarget = `http://127.0.0.1:${process.env.PORT ?? '3000'}`;
  return {
    root: here('./client'),
    plugins: [react(), tailwindcss(), stylesheetAfterFirstPaint()],
    resolve: { alias },
    // The app bundle is for signed-in screens; visitors' public pages are server HTML and never load it.
    // The manifest (dist/client/.vite/manifest.json) gives `npm run bench` the import graph to weigh each screen's code.
    build: {
      outDir: here('./dist/client'),
      emptyOutDir: true,
      sourcemap: 'hidden',
      manifest: true,
      chunkSizeWarningLimit: 800,
      // On one bar each file costs its headers and a turn on the connection: everything the entry loads is one
      // chunk, and the small pieces screens share are copied into them rather than fetched on their own.
      rolldownOptions: { output: { codeSplitting: { groups: [{ name: 'index', tags: ['$initial'] }] } } },
    },
    server: {
      host: '127.0.0.1',
      port: 5173,
      proxy: { '^/$': apiTarget, '^/c(\\?.*)?$': apiTarget, '/api': apiTarget, '/c/': apiTarget, '/e/': apiTarget, '/media': apiTarget },
    },
  };
});
