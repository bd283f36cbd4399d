// Which figure a build shows, and how firm it is: the one rule every screen and card reads
// (My builds, the editor, the public page, its JSON twin and the cards), so none can disagree.
import { CalcInputError, convert, cornerWeights, displacement, formatNumber, formatQuantity, parseUnit, powerToWeight, preferredUnit, type QuantityKind, type Unit, type UnitSystem } from '../calc';
import type { DynoRunCreateInput, PublicBuild, WeighInCreateInput } from '../schemas/build';
import type { Sections } from '../schemas/build-sections';
import type { FigureInput } from '../schemas/figure';
import { CARD_FIGURES, CARD_FIGURE_LABELS, type CardFigureKey, type KeyFigure } from '../schemas/card';

type Provenance = FigureInput['provenance'];
const RANK: Record<Provenance, number> = { measured: 0, estimated: 1, target: 2 };
/** A figure worked out from others is only as firm as the weakest of them. */
const weakest = (...ps: Provenance[]): Provenance => ps.reduce((a, b) => (RANK[b] > RANK[a] ? b : a), 'measured');

function both(kind: QuantityKind, value: number, unit: Unit, decimals?: Partial<Record<UnitSystem, number>>, override?: Partial<Record<UnitSystem, Unit>>) {
  const side = (system: UnitSystem) => {
    const to = (override?.[system] ?? preferredUnit(kind, system)) as never;
    const v = convert(kind, value, unit as never, to);
    const d = decimals?.[system];
    return { value: v, unit: to as string, text: formatQuantity({ value: v, unit: to }, d === undefined ? {} : { decimals: d }) };
  };
  return { metric: side('metric'), imperial: side('imperial'), uk: side('uk') };
}

/** A figure the build shows: the firmest candidate, with what it is ("at the wheels", "weighed"). */
export type ShownFigure = { figure: FigureInput; note?: string; at?: 'wheel' | 'flywheel' };
type Candidate = ShownFigure;

/** What the rule reads: the same few parts of the public build, the owner's build or the editor's drafts. */
export type FigureSource = {
  sections: Sections;
  weight?: FigureInput | null | undefined;
  dynoRuns: ReadonlyArray<Pick<DynoRunCreateInput, 'date' | 'measuredAt' | 'powerUnit' | 'torqueUnit' | 'peakPower' | 'peakTorque'>>;
  weighIns: ReadonlyArray<Pick<WeighInCreateInput, 'date' | 'unit' | 'leftFront' | 'rightFront' | 'leftRear' | 'rightRear' | 'withDriver'>>;
};

/** Measured beats estimated beats target; among equals the first listed wins. */
const firmest = (cands: Array<Candidate | null | undefined>) =>
  cands.filter((c): c is Candidate => Boolean(c)).sort((a, b) => RANK[a.figure.provenance] - RANK[b.figure.provenance])[0];

/** The newest record by date; among records of one day, the one listed first (the server lists newest first). */
const newest = <T extends { date: string }>(list: ReadonlyArray<T>): T | undefined => list.reduce<T | undefined>((best, r) => (!best || r.date > best.date ? r : best), undefined);

/** A weigh-in's total, to a tenth: the figure a weigh-in gives the build, applied or not. */
export const weighedTotal = (w: FigureSource['weighIns'][number]) => Math.round(cornerWeights(w).total * 10) / 10;

function powerCandidate(b: FigureSource): Candidate | undefined {
  const e = b.sections.engine;
  const dyno = newest(b.dynoRuns);
  return firmest([
    e?.flywheelPower ? { figure: e.flywheelPower, at: 'flywheel' } : null,
    e?.wheelPower ? { figure: e.wheelPower, note: 'at the wheels', at: 'wheel' } : null,
    dyno ? { figure: { value: dyno.peakPower, unit: dyno.powerUnit, provenance: 'measured', measuredOn: dyno.date }, note: dyno.measuredAt === 'wheel' ? 'at the wheels, on the dyno' : 'on the dyno', at: dyno.measuredAt } : null,
  ]);
}

function torqueCandidate(b: FigureSource): Candidate | undefined {
  const e = b.sections.engine;
  const dyno = newest(b.dynoRuns);
  return firmest([
    e?.flywheelTorque ? { figure: e.flywheelTorque, at: 'flywheel' } : null,
    e?.wheelTorque ? { figure: e.wheelTorque, note: 'at the wheels', at: 'wheel' } : null,
    dyno ? { figure: { value: dyno.peakTorque, unit: dyno.torqueUnit, provenance: 'measured', measuredOn: dyno.date }, note: dyno.measuredAt === 'wheel' ? 'at the wheels, on the dyno' : 'on the dyno', at: dyno.measuredAt } : null,
  ]);
}

function weightCandidate(b: FigureSource): Candidate | undefined {
  const w = newest(b.weighIns);
  const weighed = w ? { figure: { value: weighedTotal(w), unit: w.unit, provenance: 'measured' as const, measuredOn: w.date }, note: w.withDriver ? 'weighed with driver' : 'weighed' } : null;
  return firmest([b.weight ? { figure: b.weight } : null, weighed]);
}

function displacementCandidate(s: Sections): Candidate | undefined {
  const e = s.engine;
  if (e?.displacement) return { figure: e.displacement };
  if (e?.bore && e.stroke && e.cylinders) {
    const bore = convert('length', e.bore.value, parseUnit('length', e.bore.unit) ?? 'mm', 'mm');
    const stroke = convert('length', e.stroke.value, parseUnit('length', e.stroke.unit) ?? 'mm', 'mm');
    let d: ReturnType<typeof displacement>;
    try {
      d = displacement({ bore, stroke, unit: 'mm', cylinders: e.cylinders });
    } catch (err) {
      // A half-typed draft in the editor (a zero bore) has no displacement yet, not a crash.
      if (err instanceof CalcInputError) return undefined;
      throw err;
    }
    return { figure: { value: d.cm3, unit: 'cm3', provenance: weakest(e.bore.provenance, e.stroke.provenance) }, note: 'from bore and stroke' };
  }
  return undefined;
}

/**
 * Which power, torque, weight and displacement a build shows, in the units they were given: the
 * one rule behind My builds, the editor's numbers, the public page, its JSON and the cards.
 */
export function shownFigures(b: FigureSource): { power?: ShownFigure; torque?: ShownFigure; weight?: ShownFigure; displacement?: ShownFigure } {
  const found = { power: powerCandidate(b), torque: torqueCandidate(b), weight: weightCandidate(b), displacement: displacementCandidate(b.sections) };
  return Object.fromEntries(Object.entries(found).filter(([, f]) => f)) as ReturnType<typeof shownFigures>;
}

/** The largest JPEG of the build's photo that backs a measured figure, if it is one of the build's photos. */
function evidenceUrlOf(b: PublicBuild, c: Candidate): string | undefined {
  const id = c.figure.provenance === 'measured' ? c.figure.evidencePhotoId : undefined;
  const photo = id ? b.photos.find((p) => p.id === id) : undefined;
  return photo?.sources[photo.sources.length - 1]?.jpeg;
}

function keyFigure(b: PublicBuild, key: CardFigureKey, kind: QuantityKind, c: Candidate | undefined, opts: { decimals?: Partial<Record<UnitSystem, number>>; units?: Partial<Record<UnitSystem, Unit>> } = {}): KeyFigure | null {
  if (!c) return null;
  const evidenceUrl = evidenceUrlOf(b, c);
  const unit = parseUnit(kind, c.figure.unit);
  if (!unit) return null;
  return {
    key,
    label: CARD_FIGURE_LABELS[key],
    provenance: c.figure.provenance,
    ...(c.figure.measuredOn ? { measuredOn: c.figure.measuredOn } : {}),
    ...(evidenceUrl ? { evidenceUrl } : {}),
    ...(c.note ? { note: c.note } : {}),
    ...both(kind, c.figure.value, unit, opts.decimals, opts.units),
  };
}

/** The headline figures of a build in both unit systems, in card order. */
export function computeKeyFigures(b: PublicBuild): KeyFigure[] {
  const { power, torque, weight, displacement: volume } = shownFigures(b);
  const out: Array<KeyFigure | null> = [
    keyFigure(b, 'power', 'power', power),
    keyFigure(b, 'torque', 'torque', torque),
    keyFigure(b, 'weight', 'mass', weight),
  ];
  if (power && weight) {
    const pu = parseUnit('power', power.figure.unit);
    const mu = parseUnit('mass', weight.figure.unit);
    if (pu && mu && power.figure.value > 0 && weight.figure.value > 0) {
      const r = powerToWeight({ value: power.figure.value, unit: pu }, { value: weight.figure.value, unit: mu });
      out.push({
        key: 'powerToWeight',
        label: CARD_FIGURE_LABELS.powerToWeight,
        provenance: weakest(power.figure.provenance, weight.figure.provenance),
        ...(power.at === 'wheel' ? { note: 'with power at the wheels' } : {}),
        metric: { value: r.wPerKg, unit: 'kW/t', text: `${formatNumber(r.wPerKg)}\u00a0kW/t` },
        imperial: { value: r.lbPerHp, unit: 'lb/hp', text: `${formatNumber(r.lbPerHp, { decimals: 1 })}\u00a0lb/hp` },
        // hp per tonne, as British print gives it: 1 hp = 745.699872 W (NIST SP 811, appendix B.9).
        uk: { value: r.wPerKg / 0.745699872, unit: 'hp/t', text: `${formatNumber(r.wPerKg / 0.745699872, { decimals: 0 })}\u00a0hp/t` },
      });
    }
  }
  out.push(keyFigure(b, 'displacement', 'volume', volume, { units: { metric: 'L', imperial: 'in3', uk: 'L' }, decimals: { metric: 1, imperial: 0, uk: 1 } }));
  return out.filter((f): f is KeyFigure => f !== null);
}

/** The headline figures this build can print, in the card's order: the default offer in the card designer. */
export function availableFigures(b: PublicBuild): CardFigureKey[] {
  const have = new Set(computeKeyFigures(b).map((f) => f.key));
  return CARD_FIGURES.filter((key) => have.has(key));
}
