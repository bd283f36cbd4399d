import type { ReactNode } from 'react';

export function PageHeader({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="mb-6 border-b border-rule pb-3">
      <h1 className="font-display text-3xl font-semibold uppercase tracking-wide sm:text-4xl">{title}</h1>
      {children ? <div className="mt-1 text-graphite">{children}</div> : null}
    </div>
  );
}
