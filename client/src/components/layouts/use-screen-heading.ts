import { useLayoutEffect, useRef, type RefObject } from 'react';
import { useLocation } from 'react-router-dom';

const SITE = 'Placard';

/**
 * Each screen's title and focus follow its heading, in one place rather than on every screen: the
 * document title becomes "<the h1's text> · Placard" (kept up to date when the heading changes, e.g. a
 * renamed build), and after a navigation inside the app the focus moves to the new screen's h1, so a
 * screen reader announces the new screen instead of staying on the link that was followed. Screens
 * that load code or data first get their focus when their heading appears.
 */
export function useScreenHeading(main: RefObject<HTMLElement | null>): void {
  const { pathname } = useLocation();
  const shownPath = useRef<string | null>(null);

  // A layout effect, so the focus moves before the new screen is painted: never after someone (or a
  // test) has already clicked or typed into it.
  useLayoutEffect(() => {
    const root = main.current;
    if (!root) return;
    // The first screen of a visit keeps the browser's own starting point; later screens take the focus.
    let focusPending = shownPath.current !== null && shownPath.current !== pathname;
    shownPath.current = pathname;
    // Until the new screen's heading is there, the tab names the site, never the screen left behind.
    document.title = SITE;
    // A heading that arrives after the person has started doing something does not pull the focus away.
    const stopWaiting = () => {
      focusPending = false;
    };
    const USER_EVENTS = ['pointerdown', 'keydown', 'focusin'] as const;
    for (const type of USER_EVENTS) document.addEventListener(type, stopWaiting, { once: true });
    const follow = () => {
      const heading = root.querySelector('h1');
      const text = heading?.textContent?.trim();
      if (text && document.title !== `${text} · ${SITE}`) document.title = `${text} · ${SITE}`;
      if (heading && focusPending) {
        focusPending = false;
        if (!heading.hasAttribute('tabindex')) heading.setAttribute('tabindex', '-1');
        heading.focus({ preventScroll: false });
      }
    };
    follow();
    const watcher = new MutationObserver(follow);
    watcher.observe(root, { childList: true, subtree: true, characterData: true });
    return () => {
      watcher.disconnect();
      for (const type of USER_EVENTS) document.removeEventListener(type, stopWaiting);
    };
  }, [main, pathname]);
}
