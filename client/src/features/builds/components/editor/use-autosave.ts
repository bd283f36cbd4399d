import { useCallback, useEffect, useRef, useState } from 'react';
import type { FieldErrors, FieldValues, UseFormReturn } from 'react-hook-form';
import { FORM_LABELS, useEditor, type FormKey, type PendingState } from './editor-stores';

/** How long typing must pause before a panel saves itself. */
export const AUTOSAVE_DELAY_MS = 800;

/** What one try to store the panel came to: stored (with the key of the server's answer), or why not. */
export type SendResult = { stored: true; answerKey: string } | { stored: false; why: string };

type Options<T extends FieldValues> = {
  form: UseFormReturn<T>;
  formKey: FormKey;
  /** What the panel would send, as comparable text. */
  keyOf: (values: T) => string;
  /** The key of what the server holds now. */
  savedKey: string;
  /** Sends values the form's own check passed. */
  send: (data: T) => Promise<SendResult>;
  /** Why the form's own check refused the values. */
  refused: (errors: FieldErrors<T>) => string;
  /** Puts the saved build into the form when it changed elsewhere and the owner had not edited. */
  follow: () => void;
};

/**
 * Saves a panel by itself shortly after typing stops, one request at a time, and tells the editor
 * where its edits stand (for the status, the section marks and leaving). Invalid values are not
 * sent: the form shows why. The form is never reset under the owner's fingers by its own save's
 * answer (the server may trim what it stores; the edit is stored all the same).
 */
export function useAutosave<T extends FieldValues>({ form, formKey, keyOf, savedKey, send, refused, follow }: Options<T>) {
  const { dirty, savers } = useEditor();
  const [failure, setFailure] = useState('');
  // `saved`: what the server holds; `sent`: the last values it accepted (its answer may read differently); `answer`: that answer's key.
  const stored = useRef({ saved: savedKey, sent: '', answer: '' });
  const running = useRef<Promise<string | null> | null>(null);
  const failed = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const lastSeen = useRef('');
  const latest = useRef({ keyOf, send, refused, follow });
  useEffect(() => {
    latest.current = { keyOf, send, refused, follow };
  });

  const currentKey = useCallback(() => latest.current.keyOf(form.getValues()), [form]);
  const isStored = useCallback((key: string) => key === stored.current.saved || key === stored.current.sent, []);

  /** Tells the editor where this panel stands. */
  const report = useCallback(() => {
    const key = currentKey();
    if (isStored(key) && failed.current && !running.current) {
      failed.current = false;
      setFailure('');
    }
    const state: PendingState | undefined = running.current ? 'saving' : isStored(key) ? undefined : failed.current ? 'failed' : 'pending';
    dirty.set(formKey, state);
  }, [currentKey, isStored, dirty, formKey]);

  const saveNow = useCallback(async (): Promise<string | null> => {
    clearTimeout(timer.current);
    while (running.current) await running.current;
    if (isStored(currentKey())) {
      report();
      return null;
    }
    const attempt = (async () => {
      const sentKey = currentKey();
      let why: string | null = null;
      try {
        await form.handleSubmit(
          async (data) => {
            const result = await latest.current.send(data);
            if (result.stored) stored.current = { ...stored.current, sent: sentKey, answer: result.answerKey };
            else why = result.why;
          },
          (errors) => {
            why = latest.current.refused(errors);
          },
        )();
      } catch (err) {
        // Whatever went wrong, the panel must not say "Saving…" for ever: it says it failed, and why.
        why = err instanceof Error && err.message ? err.message : 'This part could not be saved.';
      } finally {
        running.current = null;
      }
      failed.current = why !== null;
      setFailure(why ?? '');
      return why;
    })();
    running.current = attempt;
    report();
    const why = await attempt;
    report();
    return why;
  }, [form, currentKey, isStored, report]);

  // Every change waits for a pause in the typing, then saves.
  useEffect(() => {
    const onChange = () => {
      const key = currentKey();
      if (key === lastSeen.current) return;
      lastSeen.current = key;
      clearTimeout(timer.current);
      report();
      if (!isStored(key)) timer.current = setTimeout(() => void saveNow(), AUTOSAVE_DELAY_MS);
    };
    lastSeen.current = currentKey();
    report();
    return form.subscribe({ formState: { values: true }, callback: onChange });
  }, [form, currentKey, isStored, report, saveNow]);

  // The build changed on the server: this panel's own answer, or something done elsewhere (a dyno run applied).
  useEffect(() => {
    const was = stored.current;
    if (was.saved === savedKey) return;
    stored.current = { ...was, saved: savedKey };
    const key = currentKey();
    const edited = key !== was.saved && key !== was.sent;
    if (savedKey !== was.answer && !edited) {
      stored.current = { saved: savedKey, sent: '', answer: '' };
      latest.current.follow();
    }
    report();
  }, [savedKey, currentKey, report]);

  useEffect(() => {
    savers.set(formKey, { label: FORM_LABELS[formKey], section: formKey, save: saveNow });
    return () => {
      savers.delete(formKey);
    };
  }, [savers, formKey, saveNow]);
  useEffect(
    () => () => {
      clearTimeout(timer.current);
      dirty.set(formKey, undefined);
    },
    [dirty, formKey],
  );

  return { saveNow, failure };
}
