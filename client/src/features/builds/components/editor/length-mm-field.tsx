import { useId, useState } from 'react';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';
import { formatNumber } from '@shared/calc';
import { mmRangeMessage, type MmRange } from '@shared/schemas/figure';
import { useNumbers } from '../numbers/numbers-context';

// Exact by definition: 1 in = 25.4 mm (NIST SP 811, appendix B).
const MM_PER_IN = 25.4;
type LengthUnit = 'mm' | 'in';

const parse = (text: string) => (text.trim() === '' ? undefined : Number(text.trim().replace(',', '.')));
/** Stored millimetres in the unit shown: inches to the thousandth, as a machinist would give them. */
const inUnit = (mm: number, unit: LengthUnit) => (unit === 'mm' ? String(mm) : String(Math.round((mm / MM_PER_IN) * 1000) / 1000));

/** `range` is the shared limits: its label is the box's, and a value outside it is told in the unit typed. */
type Props<T extends FieldValues> = { control: Control<T>; name: Path<T>; range: MmRange };

/**
 * A length the sheet keeps in millimetres (four-link pivots, centre of gravity height, bell-crank
 * arms), typed in millimetres or inches: inches are converted as they are typed, and the millimetres
 * kept are said under the box.
 */
export function LengthMmField<T extends FieldValues>({ control, name, range }: Props<T>) {
  const { label } = range;
  const id = useId();
  const { system } = useNumbers();
  const [unit, setUnit] = useState<LengthUnit>(system === 'imperial' ? 'in' : 'mm');
  const [text, setText] = useState<string | null>(null);
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => {
        const mm = typeof field.value === 'number' && Number.isFinite(field.value) ? (field.value as number) : undefined;
        const typed = parse(text ?? '');
        // While typing, the box keeps the person's own text; otherwise it shows the stored value in the chosen unit.
        const shown = text !== null && (typed === undefined ? mm === undefined : unit === 'mm' ? typed === mm : Math.abs(typed * MM_PER_IN - (mm ?? NaN)) < 1e-9) ? text : mm === undefined ? '' : inUnit(mm, unit);
        const change = (nextText: string, nextUnit: LengthUnit) => {
          setText(nextText);
          const n = parse(nextText);
          field.onChange(n === undefined ? undefined : Number.isFinite(n) ? (nextUnit === 'in' ? n * MM_PER_IN : n) : Number.NaN);
        };
        const outside = mm !== undefined && (mm < range.min || mm > range.max);
        const error = fieldState.error ? (outside ? mmRangeMessage(range, unit) : fieldState.error.message) : undefined;
        return (
          <div className="flex min-w-0 flex-col gap-1">
            <label htmlFor={id} className="text-sm font-semibold">
              {label}
            </label>
            <div className="flex gap-1">
              <input
                id={id}
                inputMode="decimal"
                autoComplete="off"
                value={shown}
                onChange={(e) => change(e.target.value, unit)}
                onBlur={() => {
                  setText(null);
                  field.onBlur();
                }}
                aria-invalid={error ? true : undefined}
                aria-describedby={error ? `${id}-error` : undefined}
                className={`min-h-11 min-w-[4.5rem] flex-1 border bg-white px-2 text-base tabular-nums outline-none focus:border-ink focus:ring-1 focus:ring-ink ${error ? 'border-danger' : 'border-rule'}`}
              />
              <select
                aria-label={`${label} unit`}
                value={unit}
                onChange={(e) => {
                  const next = e.target.value as LengthUnit;
                  setUnit(next);
                  // The number on screen keeps its length: the box shows it again in the new unit.
                  setText(null);
                }}
                className="min-h-11 w-16 shrink-0 border border-rule bg-white px-1 text-base"
              >
                <option value="mm">mm</option>
                <option value="in">in</option>
              </select>
            </div>
            {unit === 'in' && mm !== undefined && !error ? <p className="text-sm tabular-nums text-graphite">= {formatNumber(mm, { decimals: 1 })} mm</p> : null}
            {error ? (
              <p id={`${id}-error`} role="alert" className="text-sm text-danger">
                {error}
              </p>
            ) : null}
          </div>
        );
      }}
    />
  );
}
