import { convert, formatNumber, preferredUnit, type UnitSystem } from '@shared/calc';
import type { DynoRunCreateInput } from '@shared/schemas/build';

/** What the chart reads of a run: the owner's runs and the public page's both carry it. */
export type ChartRun = Pick<DynoRunCreateInput, 'date' | 'curve' | 'powerUnit' | 'torqueUnit' | 'peakPower' | 'peakPowerRpm' | 'peakTorque' | 'peakTorqueRpm'>;

const W = 640;
const H = 320;
const PAD = { left: 48, right: 56, top: 24, bottom: 50 };
const COLOURS = ['#D9481C', '#55524C'];
/** More than two overlaid runs cannot be told apart by colour and dash alone. */
export const MAX_CHART_RUNS = 2;

/** A run's curve in the reader's units. */
function inUnits(run: ChartRun, units: UnitSystem) {
  const pTo = preferredUnit('power', units);
  const tTo = preferredUnit('torque', units);
  return run.curve.map((p) => ({ rpm: p.rpm, power: convert('power', p.power, run.powerUnit, pTo), torque: convert('torque', p.torque, run.torqueUnit, tTo) }));
}

/** A round grid step (1, 2, 2.5 or 5 times a power of ten) giving about `ticks` lines: common practice for chart axes. */
const niceStep = (range: number, ticks: number) => {
  const raw = range / ticks;
  const mag = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 2.5, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? raw;
};

type Props = {
  /** Newest first; the first two with a curve are drawn. */
  runs: ChartRun[];
  units: UnitSystem;
  /** Unique on the page: the SVG's accessible name points at it. */
  titleId?: string;
  className?: string;
};

/**
 * Power and torque against rpm for up to two runs overlaid, as plain SVG with no script: power solid,
 * torque dashed, one colour per run. The public page renders it on the server and the editor in the
 * browser, so both draw the same chart with no charting library. Hovering a curve names its peak.
 */
export function DynoChart({ runs, units, titleId = 'dyno-title', className }: Props) {
  const drawn = runs.filter((r) => r.curve.length >= 2).slice(0, MAX_CHART_RUNS);
  if (drawn.length === 0) return null;
  const curves = drawn.map((r) => inUnits(r, units));
  const all = curves.flat();
  const rpmMin = Math.floor(Math.min(...all.map((p) => p.rpm)) / 500) * 500;
  const rpmMax = Math.ceil(Math.max(...all.map((p) => p.rpm)) / 500) * 500;
  const yMax = Math.max(...all.map((p) => Math.max(p.power, p.torque))) * 1.08;
  const step = niceStep(yMax, 5);
  const top = Math.ceil(yMax / step) * step;
  const x = (rpm: number) => PAD.left + ((rpm - rpmMin) / Math.max(1, rpmMax - rpmMin)) * (W - PAD.left - PAD.right);
  const y = (v: number) => H - PAD.bottom - (v / top) * (H - PAD.top - PAD.bottom);
  const path = (pts: Array<{ rpm: number; v: number }>) => pts.map((p, i) => `${i ? 'L' : 'M'}${x(p.rpm).toFixed(1)} ${y(p.v).toFixed(1)}`).join('');
  const rpmStep = rpmMax - rpmMin > 5000 ? 1000 : 500;
  const rpmTicks: number[] = [];
  for (let r = rpmMin; r <= rpmMax; r += rpmStep) rpmTicks.push(r);
  const yTicks: number[] = [];
  for (let v = 0; v <= top + 1e-9; v += step) yTicks.push(v);
  const pu = preferredUnit('power', units);
  const tu = preferredUnit('torque', units) === 'lbft' ? 'lb·ft' : 'N·m';
  const peak = (r: ChartRun) => `${formatNumber(convert('power', r.peakPower, r.powerUnit, pu))} ${pu} peak`;
  const label = drawn.map((r) => `${r.date}: ${peak(r)}`).join('; ');
  const peakTorque = (r: ChartRun) => `${formatNumber(convert('torque', r.peakTorque, r.torqueUnit, preferredUnit('torque', units)))} ${tu} peak`;

  return (
    <svg viewBox={`0 0 ${W} ${H}`} width={W} height={H} className={className} role="img" aria-labelledby={titleId} xmlns="http://www.w3.org/2000/svg" fontFamily="system-ui,sans-serif" fontSize="17">
      <title id={titleId}>{`Dyno curves, power solid and torque dashed. ${label}`}</title>
      {yTicks.map((v) => (
        <g key={`y${v}`}>
          <line x1={PAD.left} x2={W - PAD.right} y1={y(v)} y2={y(v)} stroke="#D8D0C0" strokeWidth="1" />
          <text x={PAD.left - 6} y={y(v) + 4} textAnchor="end" fill="#55524C">
            {formatNumber(v)}
          </text>
        </g>
      ))}
      {rpmTicks.map((r) => (
        <text key={`x${r}`} x={x(r)} y={H - PAD.bottom + 20} textAnchor="middle" fill="#55524C">
          {formatNumber(r / 1000, { decimals: rpmStep < 1000 ? 1 : 0 })}
        </text>
      ))}
      <text x={(W - PAD.right + PAD.left) / 2} y={H - 6} textAnchor="middle" fill="#55524C">
        rpm × 1000
      </text>
      <text x={W - PAD.right + 6} y={PAD.top + 10} fill="#55524C">{`${pu} /`}</text>
      <text x={W - PAD.right + 6} y={PAD.top + 30} fill="#55524C">{tu}</text>
      {curves.map((c, i) => (
        <g key={i} fill="none" stroke={COLOURS[i]} strokeWidth={i === 0 ? 3 : 2} strokeLinejoin="round">
          <path d={path(c.map((p) => ({ rpm: p.rpm, v: p.power })))}>
            <title>{`Power, ${drawn[i]!.date}: ${peak(drawn[i]!)} at ${formatNumber(drawn[i]!.peakPowerRpm)} rpm`}</title>
          </path>
          <path d={path(c.map((p) => ({ rpm: p.rpm, v: p.torque })))} strokeDasharray="7 5">
            <title>{`Torque, ${drawn[i]!.date}: ${peakTorque(drawn[i]!)} at ${formatNumber(drawn[i]!.peakTorqueRpm)} rpm`}</title>
          </path>
        </g>
      ))}
      {drawn.map((r, i) => (
        <g key={`k${i}`} transform={`translate(${PAD.left + 10 + i * 190} ${PAD.top + 6})`}>
          <rect width="14" height="4" y="-4" fill={COLOURS[i]} />
          <text x="20" fill="#1C1B19">
            {r.date}
          </text>
        </g>
      ))}
    </svg>
  );
}
