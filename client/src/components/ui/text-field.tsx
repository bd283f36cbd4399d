import { useId, type InputHTMLAttributes, type Ref } from 'react';

type Props = InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: string; ref?: Ref<HTMLInputElement> };

/** A labelled input whose error (from the form or the server) is read out with it. */
export function TextField({ label, error, hint, id, ref, className = '', ...rest }: Props) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const describedBy = [error ? `${inputId}-error` : '', hint ? `${inputId}-hint` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="text-sm font-semibold">
        {label}
      </label>
      <input
        {...rest}
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`min-h-11 border bg-white px-3 text-base outline-none focus:border-ink focus:ring-1 focus:ring-ink ${error ? 'border-danger' : 'border-rule'}`}
      />
      {hint ? <p id={`${inputId}-hint`} className="text-sm text-graphite">{hint}</p> : null}
      {error ? <p id={`${inputId}-error`} role="alert" className="text-sm text-danger">{error}</p> : null}
    </div>
  );
}
