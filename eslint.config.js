// Lint rules for the whole project: TypeScript's recommended set, the rules of React hooks, and the
// layer rules. The layers are enforced here rather than remembered: a wrong import fails `npm run lint`
// (and so `npm test`). Imports must resolve (import-x/no-unresolved), so an import the layer rules
// cannot see through is an error too.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import { importX } from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import globals from 'globals';

const TS = ['**/*.ts', '**/*.tsx'];

/** Packages shared/ may import: shared/ is pure TypeScript read by the browser and the server alike. */
const SHARED_PACKAGES = ['zod', 'papaparse'];

/** One zone of import-x/no-restricted-paths: files under `target` may not import anything under `from`. */
const zone = (target, from, message, except) => ({ target, from, message, ...(except ? { except } : {}) });

const LAYER_ZONES = [
  // shared/ → nothing of ours but itself.
  zone('./shared', ['./client', './server', './templates', './tests'], 'shared/ is pure: it imports nothing from client/, server/, templates/ or tests/.'),
  // The browser never reaches into the server or the print templates.
  zone('./client', ['./server', './tests'], 'client/ never imports server/: share code through shared/.'),
  // …nor the print templates, except templates/charts: plain SVG views the public page and the editor both draw.
  zone('./client', './templates', 'client/ never imports templates/ (only templates/charts, plain SVG views drawn on both sides).', ['./charts']),
  // The server never reaches into the client.
  zone('./server', ['./client', './tests'], 'server/ never imports client/ code.'),
  // Templates are what is printed or sent: they get finished content, never the server's code.
  zone('./templates', ['./server', './client', './tests'], 'templates/ import no server or client code: pass them content built by a service.'),
  // Routes and pages: validate → load → authorize → service → presenter → respond. Data goes through services.
  zone(['./server/routes', './server/pages'], ['./server/models', './server/db', './server/storage'], 'Routes and pages never touch models, the database or storage: call a service.'),
  // Presenters pick and rename fields; they call no service and read no database.
  zone('./server/presenters', ['./server/services', './server/routes', './server/pages', './server/middlewares', './server/db', './server/mail', './server/jobs'], 'Presenters only pick fields: no services, database, routes or middlewares.'),
  zone('./server/presenters', './server/storage', 'Presenters may only use storage key and URL shapes (storage/keys.ts).', ['./keys.ts']),
  // Services hold the rules and take plain arguments: no presenters, no req/res plumbing.
  zone('./server/services', ['./server/presenters', './server/routes', './server/pages', './server/middlewares'], 'Services do not import presenters, routes or middlewares: return models or plain values and let the route present them.'),
  // Policies decide from what they are given.
  zone('./server/policies', ['./server/services', './server/presenters', './server/routes', './server/pages', './server/middlewares', './server/db', './server/storage'], 'Policies decide from the actor and the record they are given: no services, database or presenters.'),
  // Models are the bottom of the server.
  zone('./server/models', ['./server/services', './server/presenters', './server/routes', './server/pages', './server/policies', './server/middlewares'], 'Models import no services, policies, presenters or routes.'),
];

/** A model's type may be named where a record is handed in (presenters, policies); a model's value is used by services only. */
const MODEL_VALUES_ONLY_IN_SERVICES = {
  patterns: [
    { group: ['**/models/*', '@server/models/*'], allowTypeImports: true, message: 'Only services use models; here import the model with `import type`.' },
  ],
};

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'test-results/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: TS,
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: 'tsconfig.json' })],
    },
    rules: {
      'import-x/no-unresolved': ['error', { ignore: ['\\?url$', '\\?worker$', '\\?raw$'] }],
      'import-x/no-restricted-paths': ['error', { basePath: import.meta.dirname, zones: LAYER_ZONES }],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'import-x/no-nodejs-modules': 'error',
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: `^(?!\\.|@shared/|(${SHARED_PACKAGES.join('|')})(/|$))`,
              message: `shared/ imports only itself and ${SHARED_PACKAGES.join(', ')} (it runs in the browser and on the server alike); a new package goes in SHARED_PACKAGES in eslint.config.js after a look at both sides.`,
            },
          ],
        },
      ],
    },
  },
  {
    // templates/charts also run in the browser.
    files: ['client/**/*.ts', 'client/**/*.tsx', 'templates/charts/**/*.tsx', 'templates/charts/**/*.ts'],
    rules: { 'import-x/no-nodejs-modules': 'error' },
  },
  {
    files: ['server/presenters/**/*.ts', 'server/policies/**/*.ts', 'server/presenters/**/*.tsx'],
    rules: { '@typescript-eslint/no-restricted-imports': ['error', MODEL_VALUES_ONLY_IN_SERVICES] },
  },
  {
    files: ['client/**/*.tsx', 'client/**/*.ts'],
    plugins: { 'react-hooks': reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
);
