import { GEARING_TOP_SPEED_NOTE, NOMINAL_TYRE_NOTE, rpmAtMph, topSpeedAtRevLimit, tryParseTyreCode, tyreDimensions, wheelSpacing, WHEEL_SPACING_NOTE, type TyreDimensions, type UnitSystem } from '@shared/calc';
import type { WheelsSection } from '@shared/schemas/build-sections';
import { attempt, firmness, fmt, num, read, show } from './read';
import { other, type NumberGroup, type NumberRow, type NumbersInput } from './types';

type End = 'front' | 'rear';
const END_LABEL: Record<End, string> = { front: 'Front', rear: 'Rear' };

export function tyreOf(wheels: WheelsSection | undefined, end: End): TyreDimensions | undefined {
  const code = wheels?.[end]?.tyreSize;
  if (typeof code !== 'string' || !code.trim()) return undefined;
  const parsed = tryParseTyreCode(code);
  if (!parsed.ok) return undefined;
  const d = attempt(() => tyreDimensions(parsed.size));
  return d.ok ? d.value : undefined;
}

const len = (mm: number, system: UnitSystem, extra = 0) => show('length', mm, 'mm', system, extra);

export function tyreNumbers({ sections, system }: NumbersInput): NumberGroup {
  const rows: NumberRow[] = [];
  let unreadable = '';
  for (const end of ['front', 'rear'] as const) {
    const code = sections.wheels?.[end]?.tyreSize;
    const t = tyreOf(sections.wheels, end);
    if (!t) {
      if (typeof code === 'string' && code.trim()) {
        const parsed = tryParseTyreCode(code);
        if (!parsed.ok) unreadable = `${END_LABEL[end]} tyre “${code}”: ${parsed.error.reason}.`;
      }
      continue;
    }
    const L = END_LABEL[end];
    rows.push({ label: `${L} tyre diameter`, value: len(t.diameterMm, system, system === 'imperial' ? 0 : 0), other: len(t.diameterMm, other(system)) });
    rows.push({ label: `${L} section width`, value: len(t.sectionWidthMm, system), other: len(t.sectionWidthMm, other(system)) });
    rows.push({ label: `${L} sidewall`, value: len(t.sidewallMm, system), other: len(t.sidewallMm, other(system)) });
    rows.push(system === 'imperial' ? { label: `${L} revolutions per mile`, value: fmt(t.revsPerMile), other: `${fmt(t.revsPerKm)} per km` } : { label: `${L} revolutions per km`, value: fmt(t.revsPerKm), other: `${fmt(t.revsPerMile)} per mile` });
  }
  return {
    id: 'tyres',
    title: 'Tyres',
    section: 'wheels',
    rows,
    ...(rows.length ? { notes: [NOMINAL_TYRE_NOTE] } : {}),
    ...(!rows.length ? { hint: unreadable || 'Enter a tyre size such as 285/35R18 or 33x12.50R15.' } : unreadable ? { notes: [unreadable, NOMINAL_TYRE_NOTE] } : {}),
  };
}

export function spacingNumbers({ sections, system }: NumbersInput): NumberGroup {
  const rows: NumberRow[] = [];
  let measured = false;
  for (const end of ['front', 'rear'] as const) {
    const w = sections.wheels?.[end];
    const rimWidthIn = num(w?.rimWidthIn);
    const offsetMm = read('length', w?.offset, 'mm');
    const backIn = read('length', w?.backspacing, 'in');
    if (rimWidthIn === undefined || (offsetMm === undefined && backIn === undefined)) continue;
    const s = attempt(() => wheelSpacing({ rimWidthIn, offsetMm: offsetMm ?? 0, ...(backIn !== undefined ? { measuredBackspacingIn: backIn } : {}) }));
    if (!s.ok) continue;
    measured ||= s.value.source === 'measured';
    const L = END_LABEL[end];
    const firm = firmness(s.value.source === 'measured' ? w?.backspacing : w?.offset);
    rows.push({ label: `${L} backspacing${s.value.source === 'measured' ? ' (as measured)' : ''}`, value: len(s.value.backspacingMm, system, 1), other: len(s.value.backspacingMm, other(system), 1), ...firm });
    rows.push({ label: `${L} frontspacing`, value: len(s.value.frontspacingMm, system, 1), other: len(s.value.frontspacingMm, other(system), 1), ...firm });
    if (s.value.source === 'measured') rows.push({ label: `${L} offset from that`, value: `${fmt(s.value.offsetMm)} mm`, ...firm });
  }
  return {
    id: 'spacing',
    title: 'Wheel spacing',
    section: 'wheels',
    rows,
    ...(rows.length ? { notes: [WHEEL_SPACING_NOTE + ' (common practice)'] } : { hint: 'Enter rim width and offset (or a measured backspacing).' }),
    ...(measured ? {} : {}),
  };
}

const ORDINAL = ['1st', '2nd', '3rd'];
const gearName = (n: number) => ORDINAL[n - 1] ?? `${n}th`;

export function gearingNumbers({ sections, system, cruise }: NumbersInput): NumberGroup {
  const d = sections.drivetrain ?? {};
  const gears = (d.gears ?? []).filter((g): g is number => num(g) !== undefined);
  const finalDrive = num(d.finalDrive);
  const revLimit = num(sections.engine?.revLimit);
  const tyre = tyreOf(sections.wheels, 'rear');
  const missing = [!gears.length && 'gear ratios', finalDrive === undefined && 'final drive', !tyre && 'rear tyre size', revLimit === undefined && 'rev limit (engine)'].filter(Boolean);
  const rows: NumberRow[] = [];
  if (gears.length && finalDrive !== undefined && tyre) {
    if (revLimit !== undefined) {
      const top = attempt(() => topSpeedAtRevLimit({ gears, finalDrive, tyreDiameterIn: tyre.diameterIn, revLimitRpm: revLimit }));
      if (top.ok)
        for (const g of top.value.perGear) {
          const speed = (s: UnitSystem) => (s === 'metric' ? `${fmt(g.kmh)} km/h` : `${fmt(g.mph)} mph`);
          rows.push({ label: `${gearName(g.gear)} (${fmt(g.ratio, 2)}) at ${fmt(revLimit)} rpm`, value: speed(system), other: speed(other(system)) });
        }
    }
    const tallest = Math.min(...gears);
    const mph = system === 'metric' ? cruise / 1.609344 : cruise;
    const rpm = attempt(() => rpmAtMph({ mph, gearRatio: tallest, finalDrive, tyreDiameterIn: tyre.diameterIn }));
    if (rpm.ok && cruise > 0) rows.push({ label: `At ${fmt(cruise)} ${system === 'metric' ? 'km/h' : 'mph'} in top gear (${fmt(tallest, 2)})`, value: `${fmt(rpm.value)} rpm` });
  }
  return {
    id: 'gearing',
    title: 'Gearing',
    section: 'drivetrain',
    rows,
    ...(missing.length ? { hint: `For road speeds, enter: ${missing.join(', ')}.` } : {}),
    ...(rows.length ? { notes: [GEARING_TOP_SPEED_NOTE] } : {}),
  };
}
