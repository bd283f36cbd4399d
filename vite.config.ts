import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';
import { TEST_ENV } from './tests/support/test-env.ts';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

const alias = {
  '@client': here('./client/src'),
  '@server': here('./server'),
  '@shared': here('./shared'),
  '@templates': here('./templates'),
};

// One file configures the client build, the dev server and the tests.
// The client lives in client/ (its index.html is the entry); tests run from the project root.
export default defineConfig(({ mode }) => {
  if (mode === 'test') {
    return {
      resolve: { alias },
      test: {
        include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
        environment: 'node',
        env: { ...TEST_ENV },
        globalSetup: ['tests/support/global-setup.ts'],
        // Browser journeys upload and resize photos and render PDFs: generous limits, so a busy machine
        // (several checkouts testing at once on two cores) is slow, not red. A hang still fails, later.
        testTimeout: 300_000,
        expect: { poll: { timeout: 60_000 } },
        hookTimeout: 180_000,
        // API and browser tests share one test database and one browser; two workers match the machine.
        maxWorkers: 2,
      },
    };
  }
  const apiTarget = `http://127.0.0.1:${process.env.PORT ?? '3000'}`;
  return {
    root: here('./client'),
    plugins: [react(), tailwindcss()],
    resolve: { alias },
    // The app bundle is for signed-in screens; visitors' public pages are server HTML and never load it.
    // The manifest (dist/client/.vite/manifest.json) gives `npm run bench` the import graph to weigh each screen's code.
    build: { outDir: here('./dist/client'), emptyOutDir: true, sourcemap: true, manifest: true, chunkSizeWarningLimit: 800 },
    server: {
      host: '127.0.0.1',
      port: 5173,
      proxy: { '^/$': apiTarget, '^/c(\\?.*)?$': apiTarget, '/api': apiTarget, '/c/': apiTarget, '/e/': apiTarget, '/media': apiTarget },
    },
  };
});
