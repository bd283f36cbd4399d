import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

const styles: Record<Variant, string> = {
  primary: 'bg-ink text-paper border-ink hover:bg-signal hover:border-signal',
  secondary: 'bg-transparent text-ink border-ink hover:bg-ink hover:text-paper',
  danger: 'bg-danger text-paper border-danger hover:bg-ink hover:border-ink',
  quiet: 'bg-transparent text-ink border-transparent underline underline-offset-4 hover:text-signal-ink',
};

/** Square, bordered, at least 44 px tall: easy to hit with a thumb in a field. */
export function Button({ variant = 'primary', busy = false, className = '', children, disabled, ...rest }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; busy?: boolean }) {
  return (
    <button
      {...rest}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex min-h-11 items-center justify-center gap-2 border-2 px-4 font-display text-base uppercase tracking-wide transition-colors disabled:cursor-not-allowed disabled:opacity-50 ${styles[variant]} ${className}`}
    >
      {busy ? <span aria-hidden className="inline-block h-3 w-3 animate-spin border-2 border-current border-t-transparent" /> : null}
      {children}
    </button>
  );
}
