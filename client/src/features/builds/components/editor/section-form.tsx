import type { FormEventHandler, ReactNode } from 'react';
import { ENGINEERING_CAUTION } from '@shared/calc';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';

export type SaveStatus = 'saving' | 'unsaved' | 'saved' | 'empty';

const STATUS_TEXT: Record<SaveStatus, string> = { saving: 'Saving…', unsaved: 'Unsaved changes', saved: 'Saved', empty: 'Not filled in yet' };
const STATUS_CLASS: Record<SaveStatus, string> = { saving: 'text-graphite', unsaved: 'text-caution', saved: 'text-ok', empty: 'text-graphite' };

export function SaveState({ status }: { status: SaveStatus }) {
  return (
    <span role="status" className={`font-display text-sm uppercase tracking-wide ${STATUS_CLASS[status]}`}>
      {status === 'unsaved' ? '● ' : ''}
      {STATUS_TEXT[status]}
    </span>
  );
}

/** Panel chrome for one section of the editor: an anchor, a title, its state, its own Save button. */
export function EditorSection({ id, title, status, actions, children }: { id: string; title: string; status?: SaveStatus; actions?: ReactNode; children: ReactNode }) {
  return (
    <section id={`section-${id}`} aria-labelledby={`section-${id}-title`} className="scroll-mt-20 border border-rule bg-white/60">
      <header className="flex flex-wrap items-center justify-between gap-2 border-b border-rule px-4 py-2">
        <h2 id={`section-${id}-title`} tabIndex={-1} className="font-display text-lg uppercase tracking-wide outline-none">
          {title}
        </h2>
        <div className="flex items-center gap-3">
          {actions}
          {status ? <SaveState status={status} /> : null}
        </div>
      </header>
      <div className="p-4">{children}</div>
    </section>
  );
}

type FormProps = {
  id: string;
  title: string;
  status: SaveStatus;
  formError: string;
  saving: boolean;
  onSubmit: FormEventHandler<HTMLFormElement>;
  /** Suspension, brake and chassis sections carry the engineering caution. */
  caution?: boolean;
  children: ReactNode;
  below?: ReactNode;
};

export function SectionForm({ id, title, status, formError, saving, onSubmit, caution, children, below }: FormProps) {
  return (
    <EditorSection id={id} title={title} status={status}>
      <form onSubmit={onSubmit} noValidate aria-label={title} className="flex flex-col gap-4">
        {formError ? <Notice tone="danger">{formError}</Notice> : null}
        {caution ? <p className="border-l-4 border-caution px-3 py-1 text-sm text-graphite">{ENGINEERING_CAUTION}</p> : null}
        {children}
        <div className="flex flex-wrap items-center gap-3 border-t border-rule pt-3">
          <Button type="submit" busy={saving}>
            Save {title.toLowerCase()}
          </Button>
          <SaveState status={status} />
        </div>
      </form>
      {below}
    </EditorSection>
  );
}

/** A titled group inside a section (front / rear, a linkage). */
export function FieldGroup({ title, children, className = '' }: { title: string; children: ReactNode; className?: string }) {
  return (
    <fieldset className={`border border-rule p-3 ${className}`}>
      <legend className="px-1 font-display text-sm uppercase tracking-wide text-graphite">{title}</legend>
      <div className="grid gap-4 sm:grid-cols-2">{children}</div>
    </fieldset>
  );
}
