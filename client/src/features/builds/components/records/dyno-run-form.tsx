import { useEffect, useRef, useState } from 'react';
import { useFieldArray, useForm, useWatch } from 'react-hook-form';
import { CORRECTION_STANDARDS, DYNO_PEAK_FIELDS, DynoPointSchema, DynoRunCreateSchema, type DynoRunFormInput, type OwnerBuild } from '@shared/schemas/build';
import { curvePeaks, type CurvePeaks, type CurvePoint } from '@shared/calc/dyno';
import { dynoCurveFromCsv } from '@shared/schemas/dyno-csv';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { useAddDynoRun } from '../../api/add-dyno-run';
import { asNumber, formResolver, placeServerErrors } from '../editor/form-values';
import { errorAt } from '../editor/fields';
import { DynoCsvField } from './dyno-csv-field';
import { useUnaddedRecord } from '../editor/use-unadded-record';

type Values = DynoRunFormInput & { curveMode: 'csv' | 'table' };

const today = () => new Date().toISOString().slice(0, 10);
const blank = (): Values => ({ date: today(), facility: '', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft', curveMode: 'csv', curve: [], curveCsv: '' }) as unknown as Values;

/** Only the chosen way of giving the curve is sent. */
const clean = (v: Values) => {
  const { curveMode, ...run } = v;
  const sheet = Number(run.sheetPhotoId);
  const out: Record<string, unknown> = { ...run, facility: run.facility?.trim() || undefined, note: run.note?.trim() || undefined, sheetPhotoId: sheet > 0 ? sheet : undefined };
  if (curveMode === 'csv') out.curve = [];
  else delete out.curveCsv;
  return out;
};

/** The first message anywhere in a nested error (a list's rows). */
function firstMessage(error: unknown): string | undefined {
  if (!error || typeof error !== 'object') return undefined;
  const { message } = error as { message?: unknown };
  if (typeof message === 'string') return message;
  for (const child of Object.values(error)) {
    const found = firstMessage(child);
    if (found) return found;
  }
  return undefined;
}

/** A typed curve's first problem, with the row it is on ("Row 2: Curve power must be at least 0."). */
function curveMessage(error: unknown): string | undefined {
  const row = Array.isArray(error) ? error.findIndex(Boolean) : -1;
  const message = firstMessage(row >= 0 ? (error as unknown[])[row] : error);
  return message && row >= 0 ? `Row ${row + 1}: ${message}` : message;
}

const PEAK_NAMES = Object.keys(DYNO_PEAK_FIELDS) as (keyof CurvePeaks)[];

/**
 * Puts the curve's peaks in the peak boxes that are empty or still hold the curve's earlier peaks, so
 * an owner who gives a curve never types them, and a figure the owner typed is never overwritten.
 */
function useFillPeaks(peaks: CurvePeaks | null, getValues: (name: keyof CurvePeaks) => unknown, setValue: (name: keyof CurvePeaks, value: number, options: { shouldDirty: boolean; shouldValidate: boolean }) => void) {
  const filled = useRef<Partial<CurvePeaks>>({});
  const key = peaks ? PEAK_NAMES.map((name) => peaks[name]).join(' ') : '';
  useEffect(() => {
    if (!peaks) return;
    for (const name of PEAK_NAMES) {
      const now = getValues(name);
      const untouched = now === undefined || now === '' || Number.isNaN(now) || now === filled.current[name];
      if (!untouched || now === peaks[name]) continue;
      filled.current[name] = peaks[name];
      setValue(name, peaks[name], { shouldDirty: true, shouldValidate: false });
    }
    // The key stands for the peaks: a new curve with the same peaks fills nothing new.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
}

export function DynoRunForm({ build, onDone }: { build: OwnerBuild; onDone: () => void }) {
  const add = useAddDynoRun(build.id);
  const [formError, setFormError] = useState('');
  const { register, control, handleSubmit, setError, setValue, getValues, formState: { errors, isDirty } } = useForm<Values>({ resolver: formResolver<Values>(DynoRunCreateSchema, clean), defaultValues: blank() });
  const { fields, append, remove } = useFieldArray({ control, name: 'curve' });
  useUnaddedRecord({ key: 'dyno:new', label: 'Dyno run', section: 'dyno', addLabel: 'Add the run', filled: isDirty });
  const mode = useWatch({ control, name: 'curveMode' });
  const csv = useWatch({ control, name: 'curveCsv' });
  const powerUnit = useWatch({ control, name: 'powerUnit' });
  const torqueUnit = useWatch({ control, name: 'torqueUnit' });
  // Parsed as the owner types or imports, with the same function the server saves with.
  const parsed = mode === 'csv' && csv?.trim() ? dynoCurveFromCsv(csv, { powerUnit, torqueUnit }) : null;
  const rows = useWatch({ control, name: 'curve' });
  const curve: CurvePoint[] = mode === 'csv' ? (parsed?.ok ? parsed.points : []) : (rows ?? []).flatMap((row) => DynoPointSchema.safeParse(row).data ?? []);
  const fromCurve = curvePeaks(curve);
  useFillPeaks(fromCurve, getValues, setValue);
  const peakValues = useWatch({ control, name: PEAK_NAMES });
  const filledFromCurve = fromCurve !== null && PEAK_NAMES.some((name, i) => peakValues[i] === fromCurve[name]);
  const onSubmit = handleSubmit((run) => {
    setFormError('');
    add.mutate(run as DynoRunFormInput, {
      onSuccess: onDone,
      onError: (err) => setFormError(placeServerErrors(err, setError, [...Object.keys(blank()), 'peakPower', 'peakPowerRpm', 'peakTorque', 'peakTorqueRpm', 'note', 'sheetPhotoId'])),
    });
  });
  const num = (name: keyof CurvePeaks) => <TextField key={name} label={DYNO_PEAK_FIELDS[name].label} inputMode="decimal" autoComplete="off" {...register(name, asNumber as never)} error={errorAt(errors, name)} />;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a dyno run" className="flex flex-col gap-4 border border-ink p-3">
      <h3 className="font-display text-base uppercase tracking-wide">Add a dyno run</h3>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Date" type="date" {...register('date')} error={errorAt(errors, 'date')} />
        <TextField label="Facility" placeholder="e.g. the rolling road at the county fairground" {...register('facility')} error={errorAt(errors, 'facility')} />
        <SelectField label="Correction standard" options={CORRECTION_STANDARDS.map((s) => ({ value: s, label: s }))} {...register('standard')} error={errorAt(errors, 'standard')} />
        <SelectField label="Measured at" options={[{ value: 'wheel', label: 'The wheels (chassis dyno)' }, { value: 'flywheel', label: 'The flywheel (engine dyno)' }]} {...register('measuredAt')} error={errorAt(errors, 'measuredAt')} />
        <SelectField label="Power unit" options={[{ value: 'hp', label: 'hp' }, { value: 'PS', label: 'PS' }, { value: 'kW', label: 'kW' }]} {...register('powerUnit')} />
        <SelectField label="Torque unit" options={[{ value: 'lbft', label: 'lb·ft' }, { value: 'Nm', label: 'N·m' }]} {...register('torqueUnit')} />
      </div>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-semibold">The curve</legend>
        <div className="flex flex-wrap gap-4">
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" value="csv" className="h-5 w-5 accent-ink" {...register('curveMode')} /> A CSV file or pasted
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" value="table" className="h-5 w-5 accent-ink" {...register('curveMode')} /> Type rows
          </label>
        </div>
        {mode === 'csv' ? (
          <DynoCsvField
            field={register('curveCsv')}
            parsed={parsed}
            serverError={errorAt(errors, 'curveCsv')}
            units={{ powerUnit, torqueUnit }}
            onFile={(text) => setValue('curveCsv', text, { shouldDirty: true, shouldValidate: true })}
          />
        ) : (
          <>
            <table className="w-full text-sm">
              <thead>
                <tr className="text-left text-graphite">
                  <th className="font-normal">rpm</th>
                  <th className="font-normal">Power</th>
                  <th className="font-normal">Torque</th>
                  <th />
                </tr>
              </thead>
              <tbody>
                {fields.map((field, i) => (
                  <tr key={field.id}>
                    {(['rpm', 'power', 'torque'] as const).map((k) => (
                      <td key={k} className="pr-1">
                        <input aria-label={`Row ${i + 1} ${k}`} inputMode="decimal" className={`min-h-11 w-full min-w-0 border bg-white px-2 tabular-nums ${errorAt(errors, `curve.${i}.${k}`) ? 'border-danger' : 'border-rule'}`} {...register(`curve.${i}.${k}`, asNumber as never)} />
                      </td>
                    ))}
                    <td>
                      <Button type="button" variant="quiet" aria-label={`Remove row ${i + 1}`} onClick={() => remove(i)}>
                        ✕
                      </Button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            {errors.curve ? <p role="alert" className="text-sm text-danger">{curveMessage(errors.curve)}</p> : null}
            <Button type="button" variant="secondary" className="self-start" onClick={() => append({ rpm: undefined, power: undefined, torque: undefined } as never)}>
              Add a row
            </Button>
          </>
        )}
      </fieldset>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-semibold">The peaks</legend>
        <p className="text-sm text-graphite" data-testid="peaks-hint">
          {filledFromCurve ? 'Read from the curve. Change them if the printed sheet says otherwise.' : 'Give the curve above and they are read from it, or type them from the printed sheet.'}
        </p>
        <div className="grid gap-4 sm:grid-cols-2">{PEAK_NAMES.map(num)}</div>
      </fieldset>
      <TextField label="Note" {...register('note')} error={errorAt(errors, 'note')} />
      {build.photos.length ? (
        <SelectField
          label="Photo of the printed sheet"
          hint="Upload it under Photos first, then pick it here."
          placeholder="None"
          options={build.photos.map((p, i) => ({ value: String(p.id), label: p.caption ? `Photo ${i + 1}: ${p.caption}` : `Photo ${i + 1}` }))}
          {...register('sheetPhotoId')}
          error={errorAt(errors, 'sheetPhotoId')}
        />
      ) : (
        <p className="text-sm text-graphite">To keep a photo of the printed dyno sheet with the run, upload it under Photos first.</p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={add.isPending}>
          Add the run
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
