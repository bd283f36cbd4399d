import type { ReactNode } from 'react';
import { Button } from './button';
import { Notice } from './notice';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" aria-live="polite" className="flex items-center gap-2 py-8 text-graphite">
      <span aria-hidden className="inline-block h-4 w-4 animate-spin border-2 border-graphite border-t-transparent" />
      {label}
    </p>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="border border-dashed border-rule px-6 py-10 text-center">
      <p className="font-display text-xl uppercase">{title}</p>
      {children ? <div className="mt-2 text-graphite">{children}</div> : null}
    </div>
  );
}

export function ErrorState({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <Notice tone="danger">
      <p>{message}</p>
      {onRetry ? (
        <Button variant="secondary" className="mt-2" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </Notice>
  );
}
