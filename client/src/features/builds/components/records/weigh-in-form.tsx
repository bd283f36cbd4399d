import { useState } from 'react';
import { useForm, useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { FUEL_LEVELS, WeighInCreateSchema, type OwnerBuild, type WeighInCreateInput } from '@shared/schemas/build';
import { MM_RANGES } from '@shared/schemas/build-sections';
import { LengthMmField } from '../editor/length-mm-field';
import { cornerWeights, formatNumber, formatPercent } from '@shared/calc';
import { FUEL_LEVEL_LABELS } from '@shared/build-sheet/choice-labels';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { useAddWeighIn } from '../../api/add-weigh-in';
import { asNumber, placeServerErrors } from '../editor/form-values';
import { errorAt } from '../editor/fields';
import { attempt } from '../../model/numbers/read';
import { useUnaddedRecord } from '../editor/use-unadded-record';

const CORNERS = [
  ['leftFront', 'LF', 'Left front'],
  ['rightFront', 'RF', 'Right front'],
  ['leftRear', 'LR', 'Left rear'],
  ['rightRear', 'RR', 'Right rear'],
] as const;

type Values = Omit<WeighInCreateInput, 'withDriver'> & { withDriver: boolean };

function LiveSplits({ values, unit }: { values: Partial<Values>; unit: string }) {
  const { leftFront, rightFront, leftRear, rightRear } = values;
  if ([leftFront, rightFront, leftRear, rightRear].some((v) => typeof v !== 'number' || !Number.isFinite(v))) return <p className="text-sm text-graphite">Enter all four corners to see the total and splits.</p>;
  const r = attempt(() => cornerWeights({ leftFront: leftFront!, rightFront: rightFront!, leftRear: leftRear!, rightRear: rightRear! }));
  if (!r.ok) return <p className="text-sm text-graphite">The corners must not be negative.</p>;
  const w = r.value;
  return (
    <p className="text-sm tabular-nums">
      Total <span className="font-display text-base">{formatNumber(w.total)} {unit}</span> · front {formatPercent(w.frontPercent)} · left {formatPercent(w.leftPercent)} · cross {formatPercent(w.crossPercent)}
    </p>
  );
}

/**
 * The tilted reading: with the car weighed level (the corners above), one axle is raised on blocks
 * and the two scales still under the other axle are read again.
 */
function TiltFields({ register, control, errors, axleOnScales, unit }: { register: UseFormRegister<Values>; control: Control<Values>; errors: FieldErrors<Values>; axleOnScales: 'front' | 'rear'; unit: string }) {
  return (
    <fieldset className="grid gap-4 border border-rule p-3 sm:grid-cols-2">
      <legend className="px-1 font-display text-sm uppercase tracking-wide">Tilted reading</legend>
      <p className="text-sm text-graphite sm:col-span-2">Raise one axle (measure the rise at its wheel centres), leave the other axle’s wheels on their scales and read those two scales again.</p>
      <SelectField label="Axle raised" options={[{ value: 'front', label: 'Front' }, { value: 'rear', label: 'Rear' }]} {...register('tilt.raisedAxle')} error={errorAt(errors, 'tilt.raisedAxle')} />
      <LengthMmField control={control} name="tilt.raisedHeightMm" range={MM_RANGES.tiltRaise} />
      <TextField label={`Left ${axleOnScales} scale, tilted (${unit})`} inputMode="decimal" autoComplete="off" {...register('tilt.leftRaised', asNumber as never)} error={errorAt(errors, 'tilt.leftRaised')} />
      <TextField label={`Right ${axleOnScales} scale, tilted (${unit})`} inputMode="decimal" autoComplete="off" {...register('tilt.rightRaised', asNumber as never)} error={errorAt(errors, 'tilt.rightRaised')} />
      <LengthMmField control={control} name="tilt.wheelCentreHeightMm" range={MM_RANGES.wheelCentreHeight} />
    </fieldset>
  );
}

export function WeighInForm({ build, onDone }: { build: OwnerBuild; onDone: () => void }) {
  const add = useAddWeighIn(build.id);
  const [formError, setFormError] = useState('');
  const [tilted, setTilted] = useState(false);
  const { register, control, handleSubmit, setError, formState: { errors, isDirty } } = useForm<Values>({
    resolver: zodResolver(WeighInCreateSchema) as never,
    // The tilted reading's boxes leave the values when it is switched off, so a level weigh-in sends no tilt.
    shouldUnregister: true,
    defaultValues: { date: new Date().toISOString().slice(0, 10), unit: 'kg', withDriver: false, fuelLevel: 'full', note: '' },
  });
  const values = useWatch({ control });
  useUnaddedRecord({ key: 'weighIns:new', label: 'Weigh-in', section: 'weighIns', addLabel: 'Add the weigh-in', filled: isDirty });
  const onSubmit = handleSubmit((input) => {
    setFormError('');
    add.mutate({ ...input, note: input.note?.trim() || undefined }, { onSuccess: onDone, onError: (err) => setFormError(placeServerErrors(err, setError, ['date', 'unit', 'leftFront', 'rightFront', 'leftRear', 'rightRear', 'withDriver', 'fuelLevel', 'note', 'tilt'])) });
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a weigh-in" className="flex flex-col gap-4 border border-ink p-3">
      <h3 className="font-display text-base uppercase tracking-wide">Add a weigh-in</h3>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Date" type="date" {...register('date')} error={errorAt(errors, 'date')} />
        <SelectField label="Unit" options={[{ value: 'kg', label: 'kg' }, { value: 'lb', label: 'lb' }]} {...register('unit')} error={errorAt(errors, 'unit')} />
      </div>
      {/* The scales as they sit under the car: front at the top. */}
      <div className="mx-auto w-full max-w-sm border-2 border-ink p-3" aria-label="Corner weights, front at the top" role="group">
        <p className="mb-2 text-center font-display text-xs uppercase tracking-widest text-graphite">Front</p>
        <div className="grid grid-cols-2 items-end gap-x-8 gap-y-4">
          {CORNERS.map(([name, short, long]) => (
            <TextField key={name} label={`${short} · ${long}`} inputMode="decimal" autoComplete="off" {...register(name, asNumber as never)} error={errorAt(errors, name)} />
          ))}
        </div>
        <p className="mt-2 text-center font-display text-xs uppercase tracking-widest text-graphite">Rear</p>
      </div>
      <LiveSplits values={values as Partial<Values>} unit={values.unit ?? 'kg'} />
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Fuel" options={FUEL_LEVELS.map((f) => ({ value: f, label: FUEL_LEVEL_LABELS[f] }))} {...register('fuelLevel')} error={errorAt(errors, 'fuelLevel')} />
        <label className="flex min-h-11 items-center gap-3 self-end">
          <input type="checkbox" className="h-5 w-5 accent-ink" {...register('withDriver')} />
          <span>Driver in the car</span>
        </label>
        <TextField label="Note" className="sm:col-span-2" {...register('note')} error={errorAt(errors, 'note')} />
      </div>
      <label className="flex min-h-11 items-center gap-3">
        <input type="checkbox" className="h-5 w-5 accent-ink" checked={tilted} onChange={(e) => setTilted(e.target.checked)} />
        <span>Add a tilted reading (for the centre-of-gravity height)</span>
      </label>
      {tilted ? <TiltFields register={register} control={control} errors={errors} axleOnScales={values.tilt?.raisedAxle === 'rear' ? 'front' : 'rear'} unit={values.unit ?? 'kg'} /> : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={add.isPending}>
          Add the weigh-in
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
