import type { ChangeEvent } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import type { DynoRun } from '@shared/schemas/build';
import type { DynoCsvResult } from '@shared/schemas/dyno-csv';
import { formatNumber, shownDecimals, UNIT_LABELS, type Unit } from '@shared/calc';
import { curvePeaks, DYNO_PRECISION } from '@shared/calc/dyno';
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
  // The curve comes sorted by rpm and checked against the run's limits by the same reader saving uses.
  const low = points[0]!.rpm;
  const high = points[points.length - 1]!.rpm;
  const peaks = curvePeaks(points)!;
  const read = (column: 'power' | 'torque', unit: Unit | null, runUnit: Unit) =>
    unit && unit !== runUnit ? `${columns[column].name}, converted to ${UNIT_LABELS[runUnit]}` : `${columns[column].name} in ${UNIT_LABELS[runUnit]}`;
  // As many decimals as the file gives; a converted column to the trade's whole units.
  const power = formatNumber(peaks.peakPower, { decimals: shownDecimals('power', peaks.peakPower, parsed.units.power ?? units.powerUnit, units.powerUnit, DYNO_PRECISION) });
  const torque = formatNumber(peaks.peakTorque, { decimals: shownDecimals('torque', peaks.peakTorque, parsed.units.torque ?? units.torqueUnit, units.torqueUnit, DYNO_PRECISION) });
  // The preview is drawn by the same chart as saved runs, from a run that exists only here; the
  // chart names each run's peaks, so the preview run carries them too.
  const run = { id: 0, date: 'Preview', facility: '', measuredAt: 'wheel', powerUnit: units.powerUnit, torqueUnit: units.torqueUnit, ...peaks, curve: points } as unknown as DynoRun;
  const system = units.powerUnit === 'hp' ? 'imperial' : 'metric';
  return (
    <div className="flex flex-col gap-1 border border-rule bg-white p-2" data-testid="csv-preview">
      <p className="text-sm text-ok">
        Reads as {points.length} {points.length === 1 ? 'point' : 'points'}, {low === high ? formatNumber(low) : `${formatNumber(low)}–${formatNumber(high)}`} rpm; highest power {power} {UNIT_LABELS[units.powerUnit]} at {formatNumber(peaks.peakPowerRpm)} rpm, highest torque {torque}{' '}
        {UNIT_LABELS[units.torqueUnit]} at {formatNumber(peaks.peakTorqueRpm)} rpm.
      </p>
      <p className="text-xs text-graphite">
        Columns: {columns.rpm.name}; {read('power', parsed.units.power, units.powerUnit)}; {read('torque', parsed.units.torque, units.torqueUnit)}. Nothing is saved until you add the run.
      </p>
      {points.length > 1 ? <DynoChart runs={[run]} system={system} /> : null}
    </div>
  );
}
