import { useEffect, useRef } from 'react';
import { useScreenHeading } from '@client/components/layouts/use-screen-heading';
import { Link, Outlet } from 'react-router-dom';
import { useOnline } from './use-online';

/**
 * Each judge's screen is a chunk of its own (the first load on one bar carries only the one opened). Once the
 * page is up the others load too, so a car's sheet opens with no signal even before the worker keeps them.
 */
function warmJudgeScreens() {
  const idle = (globalThis as { requestIdleCallback?: (cb: () => void) => number }).requestIdleCallback ?? ((cb: () => void) => setTimeout(cb, 1000));
  idle(() => void Promise.all([import('./judge-home-page'), import('./judge-cars-page'), import('./score-sheet-page')]).catch(() => undefined));
}

/**
 * The judge's frame: a slim bar and the page, nothing that needs the network, so the screens
 * open from the device's copy with no signal at all.
 */
export function JudgeLayout() {
  const online = useOnline();
  const main = useRef<HTMLElement>(null);
  useScreenHeading(main);
  useEffect(() => {
    // Scoped to /judge: the rest of the app keeps the network's answers.
    if ('serviceWorker' in navigator && import.meta.env.PROD) void navigator.serviceWorker.register('/judge-sw.js', { scope: '/judge' });
    warmJudgeScreens();
  }, []);
  return (
    <div className="min-h-screen bg-paper text-ink">
      <header className="flex items-center justify-between border-b-2 border-ink px-3 py-2">
        <Link to="/judge" className="font-display text-xl font-semibold uppercase tracking-[0.2em]">
          Placard<span className="text-signal">.</span> <span className="text-base tracking-wide">Judging</span>
        </Link>
        <span role="status" className={`font-display text-sm uppercase tracking-wide ${online ? 'text-ok' : 'text-danger'}`}>
          {online ? 'Online' : 'No signal'}
        </span>
      </header>
      <main id="main" ref={main} className="mx-auto max-w-xl px-3 pb-24 pt-3">
        <Outlet />
      </main>
    </div>
  );
}
