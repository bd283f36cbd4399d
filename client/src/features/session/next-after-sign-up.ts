import { safeNext } from './safe-next';

// Kept on the device, not in the tab: the confirmation link opens in a new tab (from the mail).
const KEY = 'placard-next-after-sign-up';

/** Where the person was going when they signed up, for when their confirmation link signs them in. */
export function rememberNextAfterSignUp(next: string | null): void {
  try {
    if (next) localStorage.setItem(KEY, safeNext(next));
    else localStorage.removeItem(KEY);
  } catch {
    // Storage refused (private mode): they land on My builds instead.
  }
}

/** The remembered place (once: it is forgotten as it is read), or My builds. */
export function takeNextAfterSignUp(): string {
  try {
    const next = localStorage.getItem(KEY);
    localStorage.removeItem(KEY);
    return safeNext(next);
  } catch {
    return safeNext(null);
  }
}
