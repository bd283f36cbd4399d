import { useId, type Ref, type SelectHTMLAttributes } from 'react';

type Option = { value: string; label: string };
type Props = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  options: readonly Option[];
  /** The label of an empty first choice ("not said"); leave out for a required choice. */
  placeholder?: string;
  error?: string;
  hint?: string;
  ref?: Ref<HTMLSelectElement>;
};

/** A labelled native select: the phone's own picker, big enough for a thumb. */
export function SelectField({ label, options, placeholder, error, hint, id, ref, className = '', ...rest }: Props) {
  const autoId = useId();
  const selectId = id ?? autoId;
  const describedBy = [error ? `${selectId}-error` : '', hint ? `${selectId}-hint` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={selectId} className="text-sm font-semibold">
        {label}
      </label>
      <select
        {...rest}
        ref={ref}
        id={selectId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`min-h-11 border bg-white px-2 text-base outline-none focus:border-ink focus:ring-1 focus:ring-ink ${error ? 'border-danger' : 'border-rule'}`}
      >
        {placeholder !== undefined ? <option value="">{placeholder}</option> : null}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {hint ? <p id={`${selectId}-hint`} className="text-sm text-graphite">{hint}</p> : null}
      {error ? <p id={`${selectId}-error`} role="alert" className="text-sm text-danger">{error}</p> : null}
    </div>
  );
}

/** Options from a list of ids and an optional label map. */
export const optionsOf = (values: readonly string[], labels: Partial<Record<string, string>> = {}): Option[] =>
  values.map((value) => ({ value, label: labels[value] ?? value }));
