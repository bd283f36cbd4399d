// The build sheet in words, in one unit system: the rows the public page lists and the one-line
// summaries a card prints. Both read only the public presenter's output (PublicBuild), never a model.
import { ENGINEERING_CAUTION, convert, formatNumber, formatQuantity, parseUnit, preferredUnit, shownDecimals, type QuantityKind, type TradePrecision, type Unit, type UnitOf, type UnitSystem } from '../calc';
import type { FigureInput } from '../schemas/figure';
import { BRAKE_TYPE_LABELS, FRAME_LABELS, LIMITED_SLIP_LABELS, MADE_BY_LABELS, PROVENANCE_MARKS, SPRING_LABELS, SUSPENSION_LABELS, TRANSMISSION_LABELS, inText } from './choice-labels';
import {
  SECTION_KINDS,
  SECTION_LABELS,
  type BrakesSection,
  type ChassisSection,
  type DrivetrainSection,
  type EngineSection,
  type SectionKind,
  type Sections,
  type WheelsSection,
} from '../schemas/build-sections';

export type SpecRow = { label: string; value: string };
export type SectionView = {
  kind: SectionKind;
  label: string;
  rows: SpecRow[];
  /** One line for a card: the few facts that matter most. */
  summary: string;
  madeBy: string | null;
  note: string | null;
  /** Suspension, brake and chassis figures carry the engineering caution. */
  caution: string | null;
};

/** "est." and "target" in words beside a figure; measured figures are plain. */
export const provenanceMark = (p: FigureInput['provenance']) => PROVENANCE_MARKS[p];

const withMark = (text: string, f: FigureInput) => {
  const mark = provenanceMark(f.provenance);
  return mark ? `${text} ${mark}` : text;
};

/**
 * A figure in the visitor's system, e.g. "650 hp est."; an unreadable unit prints as typed. Decimals:
 * as the owner typed them, or after converting as fine as the typed figure and the trade allow
 * (`shownDecimals`), unless `decimals` says otherwise.
 */
export function showFigure(kind: QuantityKind, f: FigureInput | undefined, units: UnitSystem, opts: { decimals?: number; mark?: boolean; to?: Unit; trade?: TradePrecision } = {}): string {
  if (!f) return '';
  const from = parseUnit(kind, f.unit);
  let text: string;
  if (!from) text = `${formatNumber(f.value, { decimals: 1 })} ${f.unit}`;
  else {
    const to = (opts.to ?? preferredUnit(kind, units)) as UnitOf<typeof kind>;
    const value = convert(kind, f.value, from as UnitOf<typeof kind>, to);
    text = formatQuantity({ value, unit: to as Unit }, { decimals: opts.decimals ?? shownDecimals(kind, f.value, from as UnitOf<typeof kind>, to, opts.trade) });
  }
  return opts.mark === false ? text : withMark(text, f);
}

// How finely the trade gives each kind of length (common practice, from memory): engine bores and
// strokes to 0.01 mm or 0.001 in; tube sizes to 0.1 mm or 0.001 in; brake rotors to the millimetre
// or 0.01 in; wheelbase, track and backspacing to the millimetre or 0.1 in.
const ENGINE_FINE: TradePrecision = { mm: 2, in: 3 };
const TUBE: TradePrecision = { mm: 1, in: 3 };
const ROTOR: TradePrecision = { mm: 0, in: 2 };
const CHASSIS: TradePrecision = { mm: 0, in: 1 };
const length = (f: FigureInput | undefined, units: UnitSystem, trade: TradePrecision) => showFigure('length', f, units, { trade });
const volume = (f: FigureInput | undefined, units: UnitSystem) => (units === 'metric' ? showFigure('volume', f, units, { to: 'L', decimals: 1 }) : showFigure('volume', f, units, { decimals: 0 }));
const rpm = (n: number | undefined) => (n ? `${formatNumber(n)} rpm` : '');
const at = (figure: string, r: number | undefined) => (figure && r ? `${figure} at ${rpm(r)}` : figure);
const join = (parts: Array<string | undefined | null | false>, sep = ', ') => parts.filter((p): p is string => Boolean(p && p.trim())).join(sep);
const cap = (s: string) => (s ? s[0]!.toUpperCase() + s.slice(1) : s);
const row = (label: string, value: string | undefined): SpecRow[] => (value && value.trim() ? [{ label, value: value.trim() }] : []);

export function cylindersText(e: EngineSection): string {
  const n = e.cylinders;
  switch (e.layout) {
    case 'V':
      return n ? `V${n}` : 'V engine';
    case 'inline':
      return n ? `inline ${n}` : 'inline engine';
    case 'flat':
      return n ? `flat ${n}` : 'flat engine';
    case 'rotary':
      return n ? `${n}-rotor rotary` : 'rotary';
    case 'electric':
      return 'electric';
    default:
      return n ? `${n}-cylinder` : '';
  }
}

function aspirationText(e: EngineSection, units: UnitSystem): string {
  if (e.aspiration === 'supercharged') return join([`supercharged${e.superchargerType ? ` (${e.superchargerType})` : ''}`, e.boost ? `${showFigure('pressure', e.boost, units)} boost` : '']);
  if (e.aspiration === 'turbocharged') {
    const count = e.turboCount && e.turboCount > 1 ? (e.turboCount === 2 ? 'twin-turbo' : `${e.turboCount} turbos`) : 'turbocharged';
    return join([count, e.boost ? `${showFigure('pressure', e.boost, units)} boost` : '']);
  }
  if (e.aspiration === 'natural') return 'naturally aspirated';
  return '';
}

/** "5.4 L V8, supercharged (twin-screw), aluminium block": the engine in one line. */
/** The engine in one line ("5.4 L V8, supercharged, aluminium block, E85"); without the displacement where a page shows it as a figure already. */
export function engineLine(e: EngineSection | undefined, units: UnitSystem, opts: { withDisplacement?: boolean } = {}): string {
  if (!e) return '';
  const size = opts.withDisplacement === false ? '' : volume(e.displacement, units);
  return join([join([size, cylindersText(e)], ' '), aspirationText(e, units), e.blockMaterial ? `${e.blockMaterial} block` : '', e.fuel]);
}

function madeByText(m: { kind: string; name?: string } | undefined): string | null {
  if (!m) return null;
  if (m.kind === 'owner') return m.name ? `${MADE_BY_LABELS.owner} (${m.name})` : MADE_BY_LABELS.owner;
  if (m.kind === 'shop') return m.name ?? 'A shop';
  if (m.kind === 'donor') return m.name ? `From a donor: ${m.name}` : MADE_BY_LABELS.donor;
  if (m.kind === 'new') return m.name ? `${MADE_BY_LABELS.new}: ${m.name}` : MADE_BY_LABELS.new;
  return null;
}

/** The label of the engine's displacement row, so a page that shows it as a key figure can leave the row out. */
export const DISPLACEMENT_ROW = 'Displacement';

function engineRows(e: EngineSection, u: UnitSystem): SpecRow[] {
  return [
    ...row('Layout', cap(cylindersText(e))),
    ...row(DISPLACEMENT_ROW, volume(e.displacement, u)),
    ...row('Bore × stroke', e.bore && e.stroke ? `${length(e.bore, u, ENGINE_FINE)} × ${length(e.stroke, u, ENGINE_FINE)}` : ''),
    ...row('Block', e.blockMaterial),
    ...row('Heads', e.headMaterial),
    ...row('Aspiration', cap(aspirationText(e, u))),
    ...row('Pulley', e.pulley),
    ...row('Induction', e.induction),
    ...row('Fuel', e.fuel),
    ...row('Ignition', e.ignition),
    ...row('Cooling', e.cooling),
    ...row('Exhaust', e.exhaust),
    ...row('Power (flywheel)', at(showFigure('power', e.flywheelPower, u), e.flywheelPowerRpm)),
    ...row('Power (wheels)', at(showFigure('power', e.wheelPower, u), e.wheelPowerRpm)),
    ...row('Torque (flywheel)', at(showFigure('torque', e.flywheelTorque, u), e.flywheelTorqueRpm)),
    ...row('Torque (wheels)', at(showFigure('torque', e.wheelTorque, u), e.wheelTorqueRpm)),
    ...row('Rev limit', rpm(e.revLimit)),
  ];
}

function transmissionText(d: DrivetrainSection): string {
  const n = d.gears?.length;
  const type = d.transmissionType ? inText(TRANSMISSION_LABELS[d.transmissionType]) : '';
  const kind = join([n && d.transmissionType !== 'cvt' ? `${n}-speed` : '', type], ' ');
  return join([kind, d.transmission], ' — ');
}

function drivetrainRows(d: DrivetrainSection, u: UnitSystem): SpecRow[] {
  return [
    ...row('Transmission', cap(transmissionText(d))),
    ...row('Gear ratios', d.gears?.map((g) => formatNumber(g, { decimals: 2 })).join(' · ')),
    ...row('Clutch', d.clutch),
    ...row('Driveshaft', d.driveshaft),
    ...row('Rear axle', d.axle),
    ...row('Final drive', d.finalDrive ? `${formatNumber(d.finalDrive, { decimals: 2 })}:1` : ''),
    ...row('Differential', d.limitedSlip ? LIMITED_SLIP_LABELS[d.limitedSlip] : ''),
    ...row('Axle splines', d.axleSplines ? String(d.axleSplines) : ''),
    ...row('Top speed', showFigure('speed', d.topSpeed, u, { decimals: 0 })),
  ];
}

type SuspensionEnd = NonNullable<ChassisSection['front']>;
function suspensionText(s: SuspensionEnd | undefined, u: UnitSystem): string {
  if (!s) return '';
  return join([s.type ? inText(SUSPENSION_LABELS[s.type]) : '', s.springType ? inText(SPRING_LABELS[s.springType]) : '', s.springRate ? `${showFigure('springRate', s.springRate, u)} springs` : '', s.dampers, s.antiRollBar ? `anti-roll bar: ${s.antiRollBar}` : '', s.description]);
}

const frameText = (c: ChassisSection) => (c.frame ? `${inText(FRAME_LABELS[c.frame])} frame` : '');

function chassisRows(c: ChassisSection, u: UnitSystem): SpecRow[] {
  return [
    ...row('Frame', cap(join([frameText(c), c.frameDescription], ' — '))),
    ...row('Wheelbase', length(c.wheelbase, u, CHASSIS)),
    ...row('Track', c.trackFront || c.trackRear ? join([c.trackFront ? `front ${length(c.trackFront, u, CHASSIS)}` : '', c.trackRear ? `rear ${length(c.trackRear, u, CHASSIS)}` : '']) : ''),
    ...row('Front suspension', cap(suspensionText(c.front, u))),
    ...row('Rear suspension', cap(suspensionText(c.rear, u))),
    ...(c.tubes ?? []).flatMap((t) =>
      row(
        cap(t.use),
        join([
          t.shape === 'rectangular' && t.height ? `rectangular ${length(t.outside, u, TUBE)} × ${length(t.height, u, TUBE)}` : `round ${length(t.outside, u, TUBE)}`,
          `${length(t.wall, u, TUBE)} wall`,
          t.material,
        ]),
      ),
    ),
  ];
}

type BrakeEnd = NonNullable<BrakesSection['front']>;
function brakeText(b: BrakeEnd | undefined, u: UnitSystem): string {
  if (!b) return '';
  if (b.type === 'none') return 'none';
  return join([
    join([b.caliperPistons ? `${b.caliperPistons}-piston` : '', b.type ? inText(BRAKE_TYPE_LABELS[b.type]) : ''], ' '),
    b.rotorDiameter ? (b.rotorThickness ? `${length(b.rotorDiameter, u, ROTOR)} × ${length(b.rotorThickness, u, ROTOR)}` : length(b.rotorDiameter, u, ROTOR)) : '',
    b.caliper,
    b.pad,
  ]);
}

function brakeRows(b: BrakesSection, u: UnitSystem): SpecRow[] {
  return [...row('Front', cap(brakeText(b.front, u))), ...row('Rear', cap(brakeText(b.rear, u))), ...row('Master cylinder', b.masterCylinder), ...row('Booster', b.booster), ...row('Parking brake', b.parkingBrake)];
}

type WheelEnd = NonNullable<WheelsSection['front']>;
function wheelText(w: WheelEnd | undefined, u: UnitSystem): string {
  if (!w) return '';
  const rim = w.rimDiameterIn && w.rimWidthIn ? `${formatNumber(w.rimDiameterIn, { decimals: w.rimDiameterIn % 1 ? 1 : 0 })} × ${formatNumber(w.rimWidthIn, { decimals: w.rimWidthIn % 1 ? 1 : 0 })} in` : w.rimDiameterIn ? `${w.rimDiameterIn} in` : '';
  const offset = w.offset ? `offset ${w.offset.value > 0 ? '+' : ''}${showFigure('length', w.offset, 'metric', { trade: CHASSIS })}` : '';
  const backspacing = w.backspacing ? `${length(w.backspacing, u, CHASSIS)} backspacing` : '';
  return join([rim, offset, backspacing, w.construction, w.tyreSize, w.tyre, w.pressure ? `${showFigure('pressure', w.pressure, u)}` : '']);
}

function wheelRows(w: WheelsSection, u: UnitSystem): SpecRow[] {
  return [...row('Front', wheelText(w.front, u)), ...row('Rear', wheelText(w.rear, u))];
}

function bodyRows(b: NonNullable<Sections['body']>): SpecRow[] {
  return [...row('Paint', b.paint), ...row('Body modifications', b.bodyMods), ...row('Glass', b.glass), ...row('Seats', b.seats), ...row('Gauges', b.gauges), ...row('Safety equipment', b.safety)];
}

function summaryOf(kind: SectionKind, s: Sections, rows: SpecRow[], u: UnitSystem): string {
  switch (kind) {
    case 'engine':
      return engineLine(s.engine, u) || join(rows.map((r) => r.value).slice(0, 3), ' · ');
    case 'drivetrain': {
      const d = s.drivetrain!;
      return join([transmissionText(d), d.finalDrive ? `${formatNumber(d.finalDrive, { decimals: 2 })}:1 final drive` : '', rows.find((r) => r.label === 'Differential')?.value.toLowerCase(), d.axle], ' · ');
    }
    case 'chassis': {
      const c = s.chassis!;
      const end = (label: string, e: SuspensionEnd | undefined) =>
        e && (e.type || e.springType) ? `${label} ${join([e.type ? inText(SUSPENSION_LABELS[e.type]) : '', e.springType ? inText(SPRING_LABELS[e.springType]) : ''], ' ')}` : '';
      return join([frameText(c) || c.frameDescription, end('front', c.front), end('rear', c.rear), c.wheelbase ? `wheelbase ${length(c.wheelbase, u, CHASSIS)}` : ''], ' · ');
    }
    case 'brakes': {
      const b = s.brakes!;
      return join([b.front ? `front ${brakeText({ ...b.front, caliper: undefined, pad: undefined }, u)}` : '', b.rear ? `rear ${brakeText({ ...b.rear, caliper: undefined, pad: undefined }, u)}` : ''], ' · ');
    }
    case 'wheels': {
      const w = s.wheels!;
      const end = (e: WheelEnd | undefined) => join([e?.rimDiameterIn && e.rimWidthIn ? `${formatNumber(e.rimDiameterIn, { decimals: e.rimDiameterIn % 1 ? 1 : 0 })}×${formatNumber(e.rimWidthIn, { decimals: e.rimWidthIn % 1 ? 1 : 0 })} in` : '', e?.tyreSize, e?.construction]);
      return join([w.front ? `front ${end(w.front)}` : '', w.rear ? `rear ${end(w.rear)}` : ''], ' · ');
    }
    case 'body': {
      const b = s.body!;
      return join([b.paint, b.bodyMods, b.seats], ' · ');
    }
    case 'extra':
      return join(rows.map((r) => `${r.label}: ${r.value}`), ' · ');
  }
}

/** How each section becomes rows of the public page. */
const ROWS_OF: Record<SectionKind, (s: Sections, u: UnitSystem) => SpecRow[]> = {
  engine: (s, u) => engineRows(s.engine!, u),
  drivetrain: (s, u) => drivetrainRows(s.drivetrain!, u),
  chassis: (s, u) => chassisRows(s.chassis!, u),
  brakes: (s, u) => brakeRows(s.brakes!, u),
  wheels: (s, u) => wheelRows(s.wheels!, u),
  body: (s) => bodyRows(s.body!),
  extra: (s) => (s.extra?.lines ?? []).map((l) => ({ label: l.label, value: l.value })),
};

/** Every public section that has something to show, in the sheet's order. */
export function sectionViews(sections: Sections, units: UnitSystem, only: readonly SectionKind[] = SECTION_KINDS): SectionView[] {
  const views: SectionView[] = [];
  for (const kind of SECTION_KINDS) {
    if (!only.includes(kind)) continue;
    const s = sections[kind];
    if (!s) continue;
    const rows = ROWS_OF[kind](sections, units);
    // "Made by" and "why this choice" belong to spec sections: the extra lines no longer offer them,
    // and what an older sheet kept there is not shown.
    const madeBy = kind === 'extra' ? null : madeByText(s.madeBy);
    const note = kind === 'extra' ? null : s.note?.trim() || null;
    if (rows.length === 0 && !madeBy && !note) continue;
    views.push({
      kind,
      label: kind === 'extra' ? 'Extras' : SECTION_LABELS[kind],
      rows,
      summary: rows.length ? summaryOf(kind, sections, rows, units) : '',
      madeBy,
      note,
      caution: kind === 'chassis' || kind === 'brakes' ? ENGINEERING_CAUTION : null,
    });
  }
  return views;
}
