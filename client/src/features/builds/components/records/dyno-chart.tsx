import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { convert, UNIT_LABELS, type UnitSystem } from '@shared/calc';
import type { DynoRun } from '@shared/schemas/build';

const COLOURS = ['#1C1B19', '#D9481C'];

/** Power and torque curves of up to two runs over each other, in the owner's units. */
export function DynoChart({ runs, system }: { runs: DynoRun[]; system: UnitSystem }) {
  const powerUnit = system === 'metric' ? 'kW' : 'hp';
  const torqueUnit = system === 'metric' ? 'Nm' : 'lbft';
  const series = runs.map((run, i) => ({
    run,
    colour: COLOURS[i % COLOURS.length]!,
    points: run.curve.map((p) => ({
      rpm: p.rpm,
      power: Math.round(convert('power', p.power, run.powerUnit, powerUnit) * 10) / 10,
      torque: Math.round(convert('torque', p.torque, run.torqueUnit, torqueUnit) * 10) / 10,
    })),
  }));
  const withCurves = series.filter((s) => s.points.length > 1);
  if (!withCurves.length) return <p className="text-sm text-graphite">No curve points on the chosen runs: peaks only.</p>;
  const name = (run: DynoRun) => `${run.date}${run.facility ? ` ${run.facility}` : ''} (${run.measuredAt})`;
  return (
    <figure className="w-full" data-testid="dyno-chart">
      <div className="h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart margin={{ top: 8, right: 4, bottom: 8, left: 4 }}>
            <CartesianGrid stroke="#D8D0C0" strokeDasharray="2 4" />
            <XAxis type="number" dataKey="rpm" domain={['dataMin', 'dataMax']} tick={{ fontSize: 12 }} unit=" rpm" allowDuplicatedCategory={false} />
            <YAxis yAxisId="power" tick={{ fontSize: 12 }} width={44} label={{ value: UNIT_LABELS[powerUnit], angle: -90, position: 'insideLeft', fontSize: 12 }} />
            <YAxis yAxisId="torque" orientation="right" tick={{ fontSize: 12 }} width={44} label={{ value: UNIT_LABELS[torqueUnit], angle: 90, position: 'insideRight', fontSize: 12 }} />
            <Tooltip formatter={(value, key) => [`${String(value)} ${String(key).startsWith('Power') ? UNIT_LABELS[powerUnit] : UNIT_LABELS[torqueUnit]}`, key]} labelFormatter={(rpm) => `${String(rpm)} rpm`} />
            <Legend wrapperStyle={{ fontSize: 12 }} />
            {withCurves.map((s) => [
              <Line key={`${s.run.id}-p`} yAxisId="power" data={s.points} dataKey="power" name={`Power ${name(s.run)}`} stroke={s.colour} strokeWidth={2} dot={false} isAnimationActive={false} />,
              <Line key={`${s.run.id}-t`} yAxisId="torque" data={s.points} dataKey="torque" name={`Torque ${name(s.run)}`} stroke={s.colour} strokeWidth={2} strokeDasharray="6 3" dot={false} isAnimationActive={false} />,
            ])}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-1 text-xs text-graphite">
        Solid: power ({UNIT_LABELS[powerUnit]}); dashed: torque ({UNIT_LABELS[torqueUnit]}). Runs on different dynos or correction standards compare only roughly.
      </figcaption>
    </figure>
  );
}
