import { useEffect } from 'react';
import { useBlocker } from 'react-router-dom';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { FORM_LABELS, useEditor, useStoreVersion, type FormKey } from './editor-stores';

/** Warns before leaving the editor with unsaved sections: in the app (a dialog) and when closing the tab (the browser's own prompt). */
export function UnsavedGuard() {
  const { dirty } = useEditor();
  useStoreVersion(dirty);
  const unsaved = dirty.entries().map(([k]) => FORM_LABELS[k as FormKey] ?? k);
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty.entries().length > 0 && currentLocation.pathname !== nextLocation.pathname);

  useEffect(() => {
    if (!unsaved.length) return;
    const warn = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = '';
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [unsaved.length]);

  return (
    <ConfirmDialog
      open={blocker.state === 'blocked'}
      title="Leave with unsaved changes?"
      confirmLabel="Leave without saving"
      cancelLabel="Stay and save"
      onCancel={() => blocker.reset?.()}
      onConfirm={() => blocker.proceed?.()}
    >
      Not saved yet: {unsaved.join(', ')}. Each section saves with its own button.
    </ConfirmDialog>
  );
}
