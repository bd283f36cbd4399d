import type { ReactNode } from 'react';

/** A square-cornered panel with a thin rule, like a block on a data sheet. */
export function Panel({ title, children, className = '', actions }: { title?: string; children: ReactNode; className?: string; actions?: ReactNode }) {
  return (
    <section className={`border border-rule bg-white/60 ${className}`}>
      {title ? (
        <header className="flex items-center justify-between gap-2 border-b border-rule px-4 py-2">
          <h2 className="font-display text-lg uppercase tracking-wide">{title}</h2>
          {actions}
        </header>
      ) : null}
      <div className="p-4">{children}</div>
    </section>
  );
}
