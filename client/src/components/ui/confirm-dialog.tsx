import { useEffect, useId, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';
import { Button } from './button';

type Props = {
  open: boolean;
  title: string;
  children?: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  /** When set, the confirm button waits until this exact text is typed (e.g. the build's title). */
  typeToConfirm?: string;
  busy?: boolean;
  danger?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
};

/** A modal question on the native <dialog>: focus is trapped, Escape cancels. */
export function ConfirmDialog({ open, title, children, confirmLabel, cancelLabel = 'Cancel', typeToConfirm, busy, danger = true, onConfirm, onCancel }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const inputId = useId();
  const [typed, setTyped] = useState('');

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  const ready = typeToConfirm === undefined || typed.trim() === typeToConfirm.trim();
  const cancel = () => {
    setTyped('');
    onCancel();
  };
  const confirm = () => {
    setTyped('');
    onConfirm();
  };
  // Enter in the box, once the text matches, does what the confirm button does: no Tab needed.
  const confirmOnEnter = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key !== 'Enter' || !ready || busy) return;
    e.preventDefault();
    confirm();
  };

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        cancel();
      }}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] border-2 border-ink bg-paper p-0 text-ink backdrop:bg-ink/50"
    >
      <div className="p-5">
        <h2 id={titleId} className="font-display text-xl uppercase tracking-wide">
          {title}
        </h2>
        {children ? <div className="mt-2 text-graphite">{children}</div> : null}
        {typeToConfirm !== undefined ? (
          <div className="mt-4 flex flex-col gap-1">
            <label htmlFor={inputId} className="text-sm font-semibold">
              Type “{typeToConfirm}” to confirm
            </label>
            <input
              id={inputId}
              value={typed}
              onChange={(e) => setTyped(e.target.value)}
              onKeyDown={confirmOnEnter}
              autoComplete="off"
              className="min-h-11 border border-rule bg-white px-3 text-base outline-none focus:border-ink focus:ring-1 focus:ring-ink"
            />
          </div>
        ) : null}
        <div className="mt-5 flex flex-wrap justify-end gap-2">
          <Button type="button" variant="secondary" onClick={cancel}>
            {cancelLabel}
          </Button>
          <Button
            type="button"
            variant={danger ? 'danger' : 'primary'}
            busy={busy}
            disabled={!ready}
            onClick={confirm}
          >
            {confirmLabel}
          </Button>
        </div>
      </div>
    </dialog>
  );
}
