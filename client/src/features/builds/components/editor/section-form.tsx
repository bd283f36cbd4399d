import type { KeyboardEvent, ReactNode } from 'react';
import { ENGINEERING_CAUTION } from '@shared/calc';
import { Notice } from '@client/components/ui/notice';

export type SaveStatus = 'saving' | 'failed' | 'saved' | 'empty';

const STATUS_TEXT: Record<SaveStatus, string> = { saving: 'Saving…', failed: 'Not saved', saved: 'Saved', empty: 'Not filled in yet' };
const STATUS_CLASS: Record<SaveStatus, string> = { saving: 'text-graphite', failed: 'text-danger', saved: 'text-ok', empty: 'text-graphite' };

/** Where a panel's edits stand; a refusal says why. */
export function SaveState({ status, why, live = true }: { status: SaveStatus; why?: string; live?: boolean }) {
  return (
    <span role={live ? 'status' : undefined} className={`min-w-0 text-sm ${STATUS_CLASS[status]}`}>
      <span className="font-display uppercase tracking-wide">
        {status === 'failed' ? '● ' : ''}
        {STATUS_TEXT[status]}
      </span>
      {status === 'failed' && why ? `: ${why}` : ''}
    </span>
  );
}

/** Panel chrome for one section of the editor: an anchor, a title, where its edits stand. */
export function EditorSection({ id, title, status, actions, children }: { id: string; title: string; status?: SaveStatus; actions?: ReactNode; children: ReactNode }) {
  return (
    <section id={`section-${id}`} aria-labelledby={`section-${id}-title`} className="scroll-mt-28 border border-rule bg-white/60 lg:scroll-mt-4">
      <header className="flex flex-wrap items-center justify-between gap-2 border-b border-rule px-4 py-2">
        <h2 id={`section-${id}-title`} tabIndex={-1} className="font-display text-lg uppercase tracking-wide outline-none">
          {title}
        </h2>
        <div className="flex items-center gap-3">
          {actions}
          {/* Said once to a screen reader: the line at the foot of the form is the live one. */}
          {status ? <SaveState status={status} live={false} /> : null}
        </div>
      </header>
      <div className="p-4">{children}</div>
    </section>
  );
}

/** What useEditorForm hands a panel. */
export type PanelProps = {
  status: SaveStatus;
  /** Why the last try did not save. */
  failure: string;
  /** Every error of the panel, each once, for the summary. */
  errors: string[];
  /** Enter in a box saves at once. */
  onSubmit: (e?: { preventDefault: () => void }) => void;
};

type FormProps = PanelProps & {
  id: string;
  title: string;
  /** Suspension, brake and chassis sections carry the engineering caution. */
  caution?: boolean;
  children: ReactNode;
  below?: ReactNode;
};

/** Enter in a one-line box saves at once instead of after the pause (there is no submit button to do it). */
const saveOnEnter = (save: PanelProps['onSubmit']) => (e: KeyboardEvent<HTMLFormElement>) => {
  const oneLine = e.target instanceof HTMLInputElement || (e.target instanceof HTMLTextAreaElement && e.target.hasAttribute('data-one-line'));
  if (e.key !== 'Enter' || !oneLine) return;
  save(e);
};

/** A section's form: it saves itself as the owner types (no Save button), and says where it stands at the top and the foot. */
export function SectionForm({ id, title, status, failure, errors, onSubmit, caution, children, below }: FormProps) {
  return (
    <EditorSection id={id} title={title} status={status}>
      <form onSubmit={onSubmit} onKeyDown={saveOnEnter(onSubmit)} noValidate aria-label={title} className="flex flex-col gap-4">
        {errors.length ? (
          <Notice tone="danger">
            <p>Not saved yet. Fix {errors.length === 1 ? 'this' : `these ${errors.length}`}, and it saves by itself:</p>
            <ul className="ml-5 list-disc">
              {errors.map((e) => (
                <li key={e}>{e}</li>
              ))}
            </ul>
          </Notice>
        ) : null}
        {caution ? <p className="border-l-4 border-caution px-3 py-1 text-sm text-graphite">{ENGINEERING_CAUTION}</p> : null}
        {children}
        <div className="flex min-h-11 flex-wrap items-center gap-3 border-t border-rule pt-3">
          <SaveState status={status} why={failure} />
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
