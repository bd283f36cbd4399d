import { useState } from 'react';
import { Controller, type Control, type FieldValues, type Path, type FieldErrors } from 'react-hook-form';
import { MAX_GEARS } from '@shared/schemas/build-sections';
import { Button } from '@client/components/ui/button';
import { useFieldWarning } from '../numbers/numbers-context';
import { errorAt, Warning } from './fields';

const ORDINAL = ['1st', '2nd', '3rd'];
const gearName = (i: number) => ORDINAL[i] ?? `${i + 1}th`;
const toNumber = (t: string) => (t.trim() === '' ? Number.NaN : Number(t.trim().replace(',', '.')));
const sameList = (texts: string[], value: number[]) => texts.length === value.length && texts.every((t, i) => Object.is(toNumber(t), value[i]) || (Number.isNaN(toNumber(t)) && Number.isNaN(value[i])));

function GearList({ value, onChange, errors, name }: { value: number[]; onChange: (v: number[]) => void; errors: FieldErrors; name: string }) {
  const [texts, setTexts] = useState(() => value.map(String));
  // Follow the form when it resets (after saving) unless the boxes already say the same.
  const shown = sameList(texts, value) ? texts : value.map((v) => (Number.isNaN(v) ? '' : String(v)));
  const update = (next: string[]) => {
    setTexts(next);
    onChange(next.map(toNumber));
  };
  return (
    <div className="flex flex-col gap-2">
      {shown.length === 0 ? <p className="text-sm text-graphite">No gears listed yet.</p> : null}
      <ol className="flex flex-col gap-2">
        {shown.map((t, i) => {
          const err = errorAt(errors, `${name}.${i}`);
          return (
            <li key={i} className="flex items-center gap-2">
              <label htmlFor={`gear-${i}`} className="w-12 font-display text-sm uppercase">
                {gearName(i)}
              </label>
              <input
                id={`gear-${i}`}
                inputMode="decimal"
                autoComplete="off"
                value={t}
                aria-invalid={err ? true : undefined}
                onChange={(e) => update(shown.map((s, j) => (j === i ? e.target.value : s)))}
                className={`min-h-11 w-28 border bg-white px-2 tabular-nums ${err ? 'border-danger' : 'border-rule'}`}
              />
              <Button type="button" variant="quiet" aria-label={`Remove ${gearName(i)} gear`} onClick={() => update(shown.filter((_, j) => j !== i))}>
                Remove
              </Button>
              {err ? <span role="alert" className="text-sm text-danger">{err}</span> : null}
            </li>
          );
        })}
      </ol>
      {shown.length < MAX_GEARS ? (
        <Button type="button" variant="secondary" className="self-start" onClick={() => update([...shown, ''])}>
          Add a gear
        </Button>
      ) : null}
    </div>
  );
}

/** Gear ratios as a list: first gear first, add and remove rows. */
export function GearsInput<T extends FieldValues>({ control, name, errors }: { control: Control<T>; name: Path<T>; errors: FieldErrors<T> }) {
  const warning = useFieldWarning('drivetrain', 'gears');
  const listError = errorAt(errors, name);
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-semibold">Gear ratios</legend>
      <Controller control={control} name={name} render={({ field }) => <GearList value={(field.value as number[] | undefined) ?? []} onChange={field.onChange} errors={errors} name={name} />} />
      {listError ? <p role="alert" className="text-sm text-danger">{listError}</p> : null}
      {warning ? <Warning message={warning.message} why={warning.why} /> : null}
    </fieldset>
  );
}
