import { cornerWeights, formatNumber, formatPercent } from '@shared/calc';
import { brakeFigures, cgHeightFigures, frontGeometryFigures, quarterMileFigures, type Worked } from '@shared/build-sheet/engineering-figures';
import { show } from './read';
import { other, type NumberGroup, type NumberRow, type NumbersInput } from './types';

const said = <T,>(w: Worked<T>, rows: NumberRow[]) => (w.status === 'refused' ? { notes: [`Cannot work this out: the ${w.label} ${w.reason}.`] } : w.status === 'missing' && !rows.length ? { hint: w.hint } : {});
const len = (mm: number, input: NumbersInput) => ({ value: show('length', mm, 'mm', input.system), other: show('length', mm, 'mm', other(input.system)) });

export function brakeNumbers(input: NumbersInput): NumberGroup {
  const b = brakeFigures(input.sections.brakes);
  const rows: NumberRow[] = [];
  const notes: string[] = [];
  if (b.status === 'ok') {
    const v = b.value;
    const bar = (p: number) => ({ value: show('pressure', p, 'bar', input.system), other: show('pressure', p, 'bar', other(input.system)) });
    const nm = (t: number) => ({ value: show('torque', t, 'Nm', input.system), other: show('torque', t, 'Nm', other(input.system)) });
    rows.push({ label: 'Front line pressure', ...bar(v.front.linePressureBar), estimate: true });
    rows.push({ label: 'Rear line pressure', ...bar(v.rear.linePressureBar), estimate: true });
    rows.push({ label: 'Front clamp force', value: show('force', v.front.clampForceN, 'N', input.system), estimate: true });
    rows.push({ label: 'Rear clamp force', value: show('force', v.rear.clampForceN, 'N', input.system), estimate: true });
    rows.push({ label: 'Front torque per wheel', ...nm(v.front.torquePerWheelNm), estimate: true });
    rows.push({ label: 'Rear torque per wheel', ...nm(v.rear.torquePerWheelNm), estimate: true });
    rows.push({ label: 'Brake split front / rear', value: `${formatPercent(v.frontPercent)} / ${formatPercent(v.rearPercent)}`, estimate: true });
    if (v.pedalForceAssumed) notes.push('No pedal force given: worked at 445 N (100 lbf), a firm stop. The split does not depend on it.');
    notes.push(`Effective radius: ${v.radiusModel === 'mean' ? 'mean radius (uniform wear), the default' : 'uniform pressure, 2/3·(ro³ − ri³)/(ro² − ri²)'}. Torque per wheel = 2 × μ × clamp force × effective radius.`);
  }
  return { id: 'brakes', title: 'Brake system', section: 'brakes', rows, caution: true, ...said(b, rows), ...(rows.length ? { notes } : {}) };
}

export function frontGeometryNumbers(input: NumbersInput): NumberGroup {
  const g = frontGeometryFigures(input.sections.chassis);
  const rows: NumberRow[] = [];
  const notes: string[] = [];
  if (g.status === 'ok') {
    const { centres, curve } = g.value;
    if (centres.instantCentre) {
      rows.push({ label: 'Instant centre, x from the centreline', ...len(centres.instantCentre.x, input), estimate: true });
      rows.push({ label: 'Instant centre height', ...len(centres.instantCentre.y, input), estimate: true });
    }
    rows.push(centres.swingArmLengthMm === 'infinite' ? { label: 'Swing-arm length', value: 'infinite (parallel arms)' } : { label: 'Swing-arm length', ...len(centres.swingArmLengthMm, input), estimate: true });
    if (centres.rollCentreHeightMm !== null) rows.push({ label: 'Roll-centre height', ...len(centres.rollCentreHeightMm, input), estimate: true });
    if (curve.camberGainPer25MmBumpDeg !== null) rows.push({ label: 'Camber gain per 25 mm of bump', value: `${formatNumber(curve.camberGainPer25MmBumpDeg, { decimals: 2 })}°`, estimate: true });
    const end = curve.steps.at(-1);
    if (end) rows.push({ label: `Track change at ${formatNumber(end.travelMm, { decimals: 0 })} mm bump`, ...len(end.trackChangeMm, input), estimate: true });
    if (centres.reason) notes.push(centres.reason);
    if (curve.stoppedAt) notes.push(curve.stoppedAt.reason);
    notes.push('Front view, solved as a linkage from 50 mm droop to 50 mm bump. Negative camber: the top of the tyre leans in. Track change is for both wheels rising together.');
  }
  return { id: 'frontGeometry', title: 'Front geometry', section: 'chassis', rows, caution: true, ...said(g, rows), ...(rows.length ? { notes } : {}) };
}

export function cgNumbers(input: NumbersInput): NumberGroup {
  const c = cgHeightFigures(input.sections.chassis, input.weighIns);
  const rows: NumberRow[] = [];
  if (c.status === 'ok') {
    rows.push({ label: 'Centre-of-gravity height', ...len(c.value.cgHeight, input), estimate: true });
    rows.push({ label: 'Tilt angle', value: `${formatNumber(c.value.tiltDeg, { decimals: 1 })}°` });
    rows.push({ label: 'From', value: c.value.from.kind === 'weigh-in' ? `the tilted weigh-in of ${c.value.from.date}` : 'the tilt figures kept with the chassis' });
  }
  return { id: 'cgHeight', title: 'Centre of gravity', section: 'chassis', rows, caution: true, ...said(c, rows), ...(rows.length ? { notes: ['h = r + L·ΔW ÷ (W·tan θ), θ = asin(raise ÷ wheelbase).'] } : {}) };
}

export function quarterMileNumbers(input: NumbersInput): NumberGroup {
  const q = quarterMileFigures(input.sections, input.weight);
  const rows: NumberRow[] = [];
  if (q.status === 'ok') {
    rows.push({ label: 'Quarter mile, elapsed time', value: `${formatNumber(q.value.elapsedTimeS, { decimals: 1 })} s`, estimate: true });
    rows.push({ label: 'Quarter mile, trap speed', value: show('speed', q.value.trapSpeedKmh, 'km/h', input.system), other: show('speed', q.value.trapSpeedKmh, 'km/h', other(input.system)), estimate: true });
  }
  return { id: 'quarterMile', title: 'Quarter-mile estimate', section: 'drivetrain', rows, ...said(q, rows), ...(rows.length && q.status === 'ok' ? { notes: [`${q.value.formula.label}’s rule of thumb from ${q.value.at} power and the weight: ET = ${q.value.formula.etConstant} × (lb/hp)^⅓, trap = ${q.value.formula.mphConstant} × (hp/lb)^⅓ mph. Traction and launch move a real slip a long way.`] } : {}) };
}

/** The newest weigh-in's front share, for the brake split check. */
export function frontWeightPercent(input: Pick<NumbersInput, 'weighIns'>): number | undefined {
  const newest = [...input.weighIns].sort((a, b) => (a.date < b.date ? 1 : -1))[0];
  if (!newest) return undefined;
  try {
    return cornerWeights(newest).frontPercent;
  } catch {
    return undefined;
  }
}
