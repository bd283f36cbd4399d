import type { ChangeEvent } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import type { DynoRun } from '@shared/schemas/build';
import type { DynoCsvResult } from '@shared/schemas/dyno-csv';
import { formatNumber, UNIT_LABELS, type Unit } from '@shared/calc';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { DynoChart } from './dyno-chart';

type RunUnits = Pick<DynoRun, 'powerUnit' | 'torqueUnit'>;

/**
 * The curve as CSV: pasted, or read from the file the dyno's software exported. The text is parsed
 * as it changes and the curve drawn before anything is saved; a problem is said once, under the field.
 */
export function DynoCsvField({ field, parsed, serverError, units, onFile }: { field: UseFormRegisterReturn<'curveCsv'>; parsed: DynoCsvResult | null; serverError?: string; units: RunUnits; onFile: (text: string) => void }) {
  const pick = async (e: ChangeEvent<HTMLInputElement>) => {
    const file = e.target.files?.[0];
    if (file) onFile(await file.text());
    e.target.value = '';
  };
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        {/* The input sits inside its label, so the keyboard focus ring shows on the visible button. */}
        <label className="inline-flex min-h-11 cursor-pointer items-center border-2 border-ink px-4 font-display text-sm uppercase tracking-wide focus-within:ring-2 focus-within:ring-signal hover:bg-ink hover:text-paper">
          Import the dyno’s CSV file
          <input type="file" accept=".csv,.txt,.tsv,text/csv,text/plain" className="sr-only" onChange={pick} />
        </label>
        <span className="text-sm text-graphite">or paste it below.</span>
      </div>
      <TextAreaField
        label="Curve as CSV"
        rows={6}
        className="[&_textarea]:font-mono"
        placeholder={'RPM,HP,TQ\n3000,210,368\n3500,250,375'}
        hint="A header row naming the rpm, power and torque columns (RPM, HP, TQ, Power (kW), Torque (lb-ft)…), then one row per point; commas, semicolons or tabs, decimal points or commas."
        {...field}
        error={parsed && !parsed.ok ? parsed.message : serverError}
      />
      {parsed?.ok ? <CurvePreview parsed={parsed} units={units} /> : null}
    </div>
  );
}

function CurvePreview({ parsed, units }: { parsed: Extract<DynoCsvResult, { ok: true }>; units: RunUnits }) {
  const { points, columns } = parsed;
  const first = points[0]!;
  const last = points[points.length - 1]!;
  const read = (column: 'power' | 'torque', unit: Unit | null, runUnit: Unit) =>
    unit && unit !== runUnit ? `${columns[column].name}, converted to ${UNIT_LABELS[runUnit]}` : `${columns[column].name} in ${UNIT_LABELS[runUnit]}`;
  // The preview is drawn by the same chart as saved runs, from a run that exists only here.
  // The chart also names each run's peaks, so the preview run carries them too.
  const top = (key: 'power' | 'torque') => points.reduce((best, p) => (p[key] > best[key] ? p : best), first);
  const run = {
    id: 0,
    date: 'Preview',
    facility: '',
    measuredAt: 'wheel',
    powerUnit: units.powerUnit,
    torqueUnit: units.torqueUnit,
    peakPower: top('power').power,
    peakPowerRpm: top('power').rpm,
    peakTorque: top('torque').torque,
    peakTorqueRpm: top('torque').rpm,
    curve: points,
  } as unknown as DynoRun;
  const system = units.powerUnit === 'hp' ? 'imperial' : 'metric';
  return (
    <div className="flex flex-col gap-1 border border-rule bg-white p-2" data-testid="csv-preview">
      <p className="text-sm text-ok">
        Reads as {points.length} points, {formatNumber(first.rpm)}–{formatNumber(last.rpm)} rpm; highest power {formatNumber(Math.max(...points.map((p) => p.power)), { decimals: 1 })} {UNIT_LABELS[units.powerUnit]}, highest torque{' '}
        {formatNumber(Math.max(...points.map((p) => p.torque)), { decimals: 1 })} {UNIT_LABELS[units.torqueUnit]}.
      </p>
      <p className="text-xs text-graphite">
        Columns: {columns.rpm.name}; {read('power', parsed.units.power, units.powerUnit)}; {read('torque', parsed.units.torque, units.torqueUnit)}. Nothing is saved until you add the run.
      </p>
      {points.length > 1 ? <DynoChart runs={[run]} system={system} /> : null}
    </div>
  );
}
