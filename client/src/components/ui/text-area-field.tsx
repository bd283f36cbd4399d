import { useId, type Ref, type TextareaHTMLAttributes } from 'react';

type Props = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string; hint?: string; ref?: Ref<HTMLTextAreaElement>; areaClassName?: string };

export function TextAreaField({ label, error, hint, id, ref, className = '', areaClassName = '', rows = 4, ...rest }: Props) {
  const autoId = useId();
  const areaId = id ?? autoId;
  const describedBy = [error ? `${areaId}-error` : '', hint ? `${areaId}-hint` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex min-w-0 flex-col gap-1 ${className}`}>
      <label htmlFor={areaId} className="text-sm font-semibold">
        {label}
      </label>
      <textarea
        {...rest}
        ref={ref}
        id={areaId}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`w-full min-w-0 border bg-white px-3 py-2 text-base outline-none focus:border-ink focus:ring-1 focus:ring-ink ${error ? 'border-danger' : 'border-rule'} ${areaClassName}`}
      />
      {hint ? <p id={`${areaId}-hint`} className="text-sm text-graphite">{hint}</p> : null}
      {error ? <p id={`${areaId}-error`} role="alert" className="text-sm text-danger">{error}</p> : null}
    </div>
  );
}
