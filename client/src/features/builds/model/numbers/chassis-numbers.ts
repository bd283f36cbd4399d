import { bellCrankMotionRatio, cornerWeights, fourLinkAntiSquat, formatPercent, rectangularTubeMassPerLength, rideFrequencyBand, rideFrequencyHz, roundTubeMassPerLength, TUBE_CORNER_NOTE, wheelRate, type UnitSystem } from '@shared/calc';
import type { ChassisSection } from '@shared/schemas/build-sections';
import { attempt, fmt, num, read, show } from './read';
import { other, type NumberGroup, type NumberRow, type NumbersInput } from './types';

const rate = (nPerMm: number, system: UnitSystem) => show('springRate', nPerMm, 'N/mm', system);

/** MR from the bell-crank arms when given (the motion ratio box is then the pushrod's own ratio), else the motion ratio. */
function motionRatioOf(end: NonNullable<ChassisSection['front']>): number | undefined {
  const mr = num(end.motionRatio);
  const springArm = num(end.bellCrankSpringArmMm);
  const pushrodArm = num(end.bellCrankPushrodArmMm);
  if (springArm !== undefined && pushrodArm !== undefined) {
    const r = attempt(() => bellCrankMotionRatio({ pushrodMotionRatio: mr ?? 1, springArmLength: springArm, pushrodArmLength: pushrodArm }));
    return r.ok ? r.value : undefined;
  }
  return mr;
}

export function suspensionNumbers({ sections, system }: NumbersInput): NumberGroup {
  const rows: NumberRow[] = [];
  for (const end of ['front', 'rear'] as const) {
    const s = sections.chassis?.[end];
    if (!s) continue;
    const spring = read('springRate', s.springRate, 'N/mm');
    const mr = motionRatioOf(s);
    if (spring === undefined || mr === undefined) continue;
    const L = end === 'front' ? 'Front' : 'Rear';
    const wr = attempt(() => wheelRate({ springRate: spring, motionRatio: mr, springAngleDeg: num(s.springAngleDeg) ?? 0 }));
    if (!wr.ok) continue;
    rows.push({ label: `${L} wheel rate (motion ratio ${fmt(mr, 2)})`, value: rate(wr.value, system), other: rate(wr.value, other(system)), estimate: true });
    const mass = read('mass', s.cornerSprungMass, 'kg');
    if (mass === undefined) continue;
    const hz = attempt(() => rideFrequencyHz({ wheelRate: { value: wr.value, unit: 'N/mm' }, cornerSprungMass: { value: mass, unit: 'kg' } }));
    if (hz.ok) {
      const band = attempt(() => rideFrequencyBand(hz.value));
      rows.push({ label: `${L} ride frequency`, value: `${fmt(hz.value, 2)} Hz`, other: band.ok ? band.value.label : undefined, estimate: true });
    }
  }
  return {
    id: 'suspension',
    title: 'Suspension',
    section: 'chassis',
    rows,
    caution: true,
    ...(rows.length ? { notes: ['Wheel rate = spring rate × motion ratio² × cos² of the spring angle; motion ratio is spring travel ÷ wheel travel. Ride-frequency bands are common practice.'] } : { hint: 'Enter a spring rate and motion ratio (and the corner’s sprung mass for ride frequency).' }),
  };
}

export function antiSquatNumbers({ sections, system }: NumbersInput): NumberGroup {
  const link = sections.chassis?.rear?.fourLink;
  const wheelbase = read('length', sections.chassis?.wheelbase, 'mm');
  const rows: NumberRow[] = [];
  const notes: string[] = [];
  // A pivot counts once both its x and y are in; the sheet may hold a four-link filled in part way.
  const point = (p?: { x?: number; y?: number }) => {
    const x = num(p?.x);
    const y = num(p?.y);
    return x !== undefined && y !== undefined ? { x, y } : undefined;
  };
  const [upperFront, upperRear, lowerFront, lowerRear] = [link?.upperFront, link?.upperRear, link?.lowerFront, link?.lowerRear].map(point);
  const cgHeight = num(link?.cgHeightMm);
  if (upperFront && upperRear && lowerFront && lowerRear && cgHeight !== undefined && wheelbase !== undefined) {
    const r = attempt(() =>
      fourLinkAntiSquat({
        upperLink: { chassisEnd: upperFront, axleEnd: upperRear },
        lowerLink: { chassisEnd: lowerFront, axleEnd: lowerRear },
        wheelbase,
        cgHeight,
      }),
    );
    if (r.ok) {
      const res = r.value;
      if (res.instantCentre) {
        const ic = res.instantCentre;
        rows.push({ label: 'Instant centre ahead of the axle', value: show('length', ic.x, 'mm', system), other: show('length', ic.x, 'mm', other(system)), estimate: true });
        rows.push({ label: 'Instant centre height', value: show('length', ic.y, 'mm', system), other: show('length', ic.y, 'mm', other(system)), estimate: true });
      }
      if (res.antiSquatPercent !== null) rows.push({ label: 'Anti-squat', value: formatPercent(res.antiSquatPercent, { decimals: 0 }), estimate: true });
      if ('reason' in res) notes.push(res.reason);
    } else notes.push('The link points do not give a geometry: check them.');
  }
  return {
    id: 'antiSquat',
    title: 'Rear four-link',
    section: 'chassis',
    rows,
    caution: true,
    ...(rows.length || notes.length ? { notes: [...notes, 'Side view: anti-squat % = (IC height ÷ IC distance) ÷ (CG height ÷ wheelbase) × 100.'] } : { hint: 'Enter the four link points, the CG height and the wheelbase for anti-squat.' }),
  };
}

export function tubeNumbers({ sections, system }: NumbersInput): NumberGroup {
  const rows: NumberRow[] = [];
  let rectangular = false;
  for (const t of sections.chassis?.tubes ?? []) {
    const od = read('length', t.outside, 'mm');
    const wall = read('length', t.wall, 'mm');
    const h = read('length', t.height, 'mm');
    if (od === undefined || wall === undefined) continue;
    const m = attempt(() => (t.shape === 'rectangular' ? rectangularTubeMassPerLength({ width: od, height: h ?? od, wall, unit: 'mm' }) : roundTubeMassPerLength({ outsideDiameter: od, wall, unit: 'mm' })));
    if (!m.ok) continue;
    rectangular ||= t.shape === 'rectangular';
    const perLength = (s: UnitSystem) => (s === 'metric' ? `${fmt(m.value.kgPerM, 2)} kg/m` : `${fmt(m.value.lbPerFt, 3)} lb/ft`);
    rows.push({ label: `${t.use || 'Tube'} (steel)`, value: perLength(system), other: perLength(other(system)), estimate: true });
  }
  return { id: 'tubes', title: 'Tube mass', section: 'chassis', rows, caution: true, ...(rectangular ? { notes: [TUBE_CORNER_NOTE] } : {}), ...(!rows.length ? { hint: 'Add tube lines (outside size and wall) for their steel mass per length.' } : {}) };
}

export function cornerNumbers({ weighIns, system }: NumbersInput): NumberGroup {
  const newest = [...weighIns].sort((a, b) => (a.date < b.date ? 1 : a.date > b.date ? -1 : b.id - a.id))[0];
  const rows: NumberRow[] = [];
  if (newest) {
    const c = attempt(() => cornerWeights(newest));
    if (c.ok) {
      const w = c.value;
      const mass = (v: number, s: UnitSystem) => show('mass', v, newest.unit, s);
      rows.push({ label: `Total (${newest.date}, ${newest.withDriver ? 'with driver' : 'no driver'})`, value: mass(w.total, system), other: mass(w.total, other(system)) });
      rows.push({ label: 'Front / rear', value: `${formatPercent(w.frontPercent)} / ${formatPercent(w.rearPercent)}` });
      rows.push({ label: 'Left / right', value: `${formatPercent(w.leftPercent)} / ${formatPercent(w.rightPercent)}` });
      rows.push({ label: 'Cross (RF + LR)', value: formatPercent(w.crossPercent) });
    }
  }
  return { id: 'corners', title: 'Corner weights', section: 'weighIns', rows, ...(!rows.length ? { hint: 'Add a weigh-in for the corner weight splits.' } : {}) };
}
