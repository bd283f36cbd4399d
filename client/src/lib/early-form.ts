import { useEffect, useState } from 'react';

/**
 * What a person did on a first screen the server drew before the app's code arrived (server/first-screens/): the
 * values they typed, whether they sent the form (its send is held by the page's early script) and which box had
 * the focus, and the answer the page's early script already had for it (the gate's look-up). Kept once, just before React's first render replaces the drawn screen, and handed to the app's own
 * screen, which carries on from there: nothing typed on a weak signal is lost to the app's arrival.
 */
export type EarlyForm = { values: Record<string, string>; sent: boolean; focused: string | null; answer: unknown };

const kept = new Map<string, EarlyForm>();

/**
 * Reads every drawn form under `root` (main.tsx calls this once, before the first render), and answers the
 * address of a link tapped on the drawn screen (held by its early script), for the app to open at once.
 */
export function keepEarlyForms(root: ParentNode): string | null {
  for (const form of Array.from(root.querySelectorAll<HTMLFormElement>('form[data-early-form]'))) {
    const values: Record<string, string> = {};
    let focused: string | null = null;
    for (const field of Array.from(form.elements)) {
      // Read, then closed: a key pressed before React's screen replaces this one would otherwise be lost.
      if (field instanceof HTMLButtonElement) field.disabled = true;
      if (!(field instanceof HTMLInputElement) || !field.name) continue;
      values[field.name] = field.value;
      if (field === document.activeElement) focused = field.name;
      field.readOnly = true;
    }
    kept.set(form.dataset.earlyForm!, { values, sent: form.hasAttribute('data-early-sent'), focused, answer: parsed(form.dataset.earlyReply) });
  }
  const go = root.querySelector<HTMLElement>('[data-early-go]')?.dataset.earlyGo ?? null;
  // Only an address of this app, as the drawn screen's own links are.
  return go && go.startsWith('/') && !go.startsWith('//') ? go : null;
}

/** The early look-up's answer as the API sent it (it is the same API the app reads), or null. */
function parsed(json: string | undefined): unknown {
  if (!json) return null;
  try {
    return JSON.parse(json) as unknown;
  } catch {
    return null;
  }
}

/** The drawn form of this screen as the person left it, for the screen's first render only (a later visit starts empty). */
export function useEarlyForm(name: string): EarlyForm | null {
  const [form] = useState(() => kept.get(name) ?? null);
  useEffect(() => void kept.delete(name), [name]);
  return form;
}
