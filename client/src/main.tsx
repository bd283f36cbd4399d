import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { Providers } from './app/providers';
import { router } from './app/router';
import { keepEarlyForms } from './lib/early-form';
import './styles.css';

/**
 * The built index.html only preloads the stylesheet, so its opening text paints before the CSS arrives
 * (seconds on one bar: vite.config.ts, `stylesheetAfterFirstPaint`). Applied here, and React waits for it,
 * so no screen ever shows unstyled. In development Vite injects the CSS from the import above instead.
 */
function stylesheetApplied(): Promise<void> {
  const preload = document.querySelector<HTMLLinkElement>('link[rel="preload"][as="style"]');
  if (!preload) return Promise.resolve();
  const sheet = document.createElement('link');
  sheet.rel = 'stylesheet';
  sheet.crossOrigin = preload.crossOrigin;
  sheet.href = preload.href;
  // A stylesheet that fails (no signal, no kept copy) must not keep the screen from opening.
  const applied = new Promise<void>((resolve) => {
    sheet.onload = sheet.onerror = () => resolve();
  });
  document.head.append(sheet);
  return applied;
}

/** The first screen's code (a lazy route) is in: until then the opening text stays, instead of a blank page. */
function routerReady(): Promise<void> {
  if (router.state.initialized) return Promise.resolve();
  return new Promise((resolve) => {
    const stop = router.subscribe((state) => {
      if (!state.initialized) return;
      stop();
      resolve();
    });
  });
}

void Promise.all([stylesheetApplied(), routerReady()]).then(() => {
  const root = document.getElementById('root')!;
  // A first screen the server drew (sign-in, the gate, a judge's cars) may hold what the person typed, or a car
  // they tapped: the app's screen takes it on.
  const tapped = keepEarlyForms(root);
  if (tapped) void router.navigate(tapped);
  createRoot(root).render(
    <StrictMode>
      <Providers>
        <RouterProvider router={router} />
      </Providers>
    </StrictMode>,
  );
});
