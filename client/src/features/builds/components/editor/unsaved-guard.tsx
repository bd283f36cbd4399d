import { useEffect, useRef, useState } from 'react';
import { useBlocker } from 'react-router-dom';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { useEditor, useStoreVersion, type Saver } from './editor-stores';

type Refusal = { key: string; label: string; section: string; why: string };

/** Saves every panel now; resolves to the panels that would not save, and why. */
async function saveAll(savers: Map<string, Saver>): Promise<Refusal[]> {
  const results = await Promise.all([...savers.entries()].map(async ([key, { label, section, save }]) => ({ key, label, section, why: await save() })));
  return results.filter((r): r is Refusal => r.why !== null);
}

/**
 * Leaving never drops edits silently. In the app (a link, the back button) every panel is saved
 * first and the editor is left once all are stored; a panel that will not save is named, with why.
 * Closing the tab or hiding it (a phone switching apps) saves at once, and the browser asks first
 * while anything is not stored yet.
 */
export function UnsavedGuard() {
  const { dirty, savers } = useEditor();
  useStoreVersion(dirty);
  const unstored = dirty.entries().length;
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty.entries().length > 0 && currentLocation.pathname !== nextLocation.pathname);
  const blockerRef = useRef(blocker);
  useEffect(() => {
    blockerRef.current = blocker;
  });
  const [refusals, setRefusals] = useState<Refusal[]>([]);
  const fixAt = useRef<string | null>(null);
  const blocked = blocker.state === 'blocked';

  // Staying to fix: once the dialog is gone, the keyboard goes where the fixing is (the first field
  // in trouble, else the panel's first field), not back to the link that was clicked.
  useEffect(() => {
    if (!fixAt.current || blocked || refusals.length) return;
    const section = document.getElementById(`section-${fixAt.current}`);
    fixAt.current = null;
    section?.scrollIntoView({ block: 'start' });
    const target = section?.querySelector<HTMLElement>('[aria-invalid="true"]') ?? section?.querySelector<HTMLElement>('input, select, textarea');
    target?.focus({ preventScroll: true });
  }, [blocked, refusals.length]);

  useEffect(() => {
    if (!blocked) return;
    let stayed = false;
    void saveAll(savers).then((refused) => {
      if (stayed) return;
      if (refused.length === 0) blockerRef.current.proceed?.();
      else setRefusals(refused);
    });
    return () => {
      stayed = true;
    };
  }, [blocked, savers]);

  useEffect(() => {
    if (!unstored) return;
    const onLeave = (e: BeforeUnloadEvent) => {
      // The saves go out with keepalive, so they arrive even if the tab closes; the browser's own question buys the time.
      void saveAll(savers);
      e.preventDefault();
      e.returnValue = '';
    };
    const onHide = () => {
      if (document.visibilityState === 'hidden') void saveAll(savers);
    };
    window.addEventListener('beforeunload', onLeave);
    document.addEventListener('visibilitychange', onHide);
    return () => {
      window.removeEventListener('beforeunload', onLeave);
      document.removeEventListener('visibilitychange', onHide);
    };
  }, [unstored, savers]);

  const stay = () => {
    const first = refusals[0]?.section;
    setRefusals([]);
    blocker.reset?.();
    fixAt.current = first ?? null;
  };
  const leave = () => {
    setRefusals([]);
    blocker.proceed?.();
  };

  if (blocked && refusals.length) {
    return (
      <ConfirmDialog open title="Not saved" confirmLabel="Leave without saving" cancelLabel="Stay and fix" onCancel={stay} onConfirm={leave}>
        <p>These changes could not be saved:</p>
        <ul className="mt-2 ml-5 list-disc">
          {refusals.map((r) => (
            <li key={r.key}>
              <span className="font-semibold text-ink">{r.label}</span>: {r.why}
            </li>
          ))}
        </ul>
      </ConfirmDialog>
    );
  }
  return (
    <ConfirmDialog open={blocked} title="Saving before you leave…" confirmLabel="Leave without saving" cancelLabel="Stay" onCancel={stay} onConfirm={leave}>
      Saving: {dirty.entries().map(([k]) => savers.get(k)?.label ?? k).join(', ') || 'done'}.
    </ConfirmDialog>
  );
}
