import { useCallback, useEffect, useRef, useState } from 'react';
import { ApiError } from '@client/lib/api';
import { useEditor } from './editor-stores';
import { AUTOSAVE_DELAY_MS } from './use-autosave';

export type TextSaveState = 'idle' | 'saving' | 'saved' | 'failed';

type Options = {
  /** The editor's key for it, e.g. `photos:12`. */
  saverKey: string;
  label: string;
  section: string;
  /** What the server holds. */
  stored: string;
  send: (text: string) => Promise<unknown>;
};

/**
 * One text box outside a section form (a photo's caption) that saves itself like the forms do:
 * after a pause in the typing, on leaving the box, and before leaving the editor.
 */
export function useAutosavedText({ saverKey, label, section, stored, send }: Options) {
  const { dirty, savers } = useEditor();
  const [text, setText] = useState(stored);
  const [state, setState] = useState<TextSaveState>('idle');
  const [why, setWhy] = useState('');
  const current = useRef({ text: stored, stored, send });
  const running = useRef<Promise<string | null> | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  useEffect(() => {
    current.current = { ...current.current, stored, send };
  }, [stored, send]);

  const saveNow = useCallback(async (): Promise<string | null> => {
    clearTimeout(timer.current);
    while (running.current) await running.current;
    const value = current.current.text.trim();
    if (value === current.current.stored.trim()) {
      dirty.set(saverKey, undefined);
      return null;
    }
    const attempt = (async () => {
      dirty.set(saverKey, 'saving');
      setState('saving');
      try {
        await current.current.send(value);
        current.current.stored = value;
        setState('saved');
        setWhy('');
        dirty.set(saverKey, current.current.text.trim() === value ? undefined : 'pending');
        return null;
      } catch (err) {
        const reason = err instanceof ApiError ? (Object.values(err.fields)[0] ?? err.message) : (err as Error).message;
        setState('failed');
        setWhy(reason);
        dirty.set(saverKey, 'failed');
        return reason;
      } finally {
        running.current = null;
      }
    })();
    running.current = attempt;
    return attempt;
  }, [dirty, saverKey]);

  const change = (next: string) => {
    setText(next);
    current.current.text = next;
    clearTimeout(timer.current);
    const same = next.trim() === current.current.stored.trim();
    dirty.set(saverKey, same ? undefined : 'pending');
    if (!same) timer.current = setTimeout(() => void saveNow(), AUTOSAVE_DELAY_MS);
  };

  useEffect(() => {
    savers.set(saverKey, { label, section, save: saveNow });
    return () => {
      savers.delete(saverKey);
    };
  }, [savers, saverKey, label, section, saveNow]);
  useEffect(
    () => () => {
      clearTimeout(timer.current);
      dirty.set(saverKey, undefined);
    },
    [dirty, saverKey],
  );

  return { text, change, saveNow, state, why };
}
