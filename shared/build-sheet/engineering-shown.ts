// The worked-out figures an owner chose to show visitors (the public page, its JSON twin and the
// data-sheet card): the brake split when the brakes say `showFigures`, the front roll-centre height,
// camber gain and CG height when the chassis does. Every one is an estimate and goes out in words,
// never as a bare number, so nothing can print NaN or Infinity; the engineering caution goes with them.
import { ENGINEERING_CAUTION, convert, formatNumber, preferredUnit, type UnitSystem } from '../calc';
import type { Sections } from '../schemas/build-sections';
import type { WeighInCreateInput } from '../schemas/build';
import { brakeFigures, cgHeightFigures, frontGeometryFigures, type BrakeFigures, type FrontGeometryFigures } from './engineering-figures';

export const SHOWN_ENGINEERING_KEYS = ['brakeSplit', 'rollCentre', 'camberGain', 'cgHeight'] as const;
export type ShownEngineeringKey = (typeof SHOWN_ENGINEERING_KEYS)[number];
export type ShownEngineeringFigure = { key: ShownEngineeringKey; label: string; value: string };

export type ShownEngineering = {
  figures: ShownEngineeringFigure[];
  /** Always said beside the figures: they describe a car, they do not certify it. */
  caution: string;
  /** What the diagrams are drawn from, when their figure is shown. */
  brakes: BrakeFigures | null;
  geometry: FrontGeometryFigures | null;
};

type Source = { sections: Sections; weighIns: ReadonlyArray<Pick<WeighInCreateInput, 'date' | 'leftFront' | 'rightFront' | 'leftRear' | 'rightRear' | 'tilt'>> };

const length = (mm: number, units: UnitSystem) => {
  const unit = preferredUnit('length', units);
  return unit === 'in' ? `${formatNumber(convert('length', mm, 'mm', 'in'), { decimals: 1 })}\u00a0in` : `${formatNumber(mm, { decimals: 0 })}\u00a0mm`;
};
/**
 * The camber change over the first 25 mm of bump, per inch where the page reads in inches: 1 in is 25.4 mm
 * (exact, by definition), and over so short a travel the curve is taken as straight (common practice).
 */
const camberGainWords = (gainPer25Mm: number, units: UnitSystem) =>
  preferredUnit('length', units) === 'in' ? `${signed((gainPer25Mm * 25.4) / 25, 2)}° per inch of bump est.` : `${signed(gainPer25Mm, 2)}° per 25\u00a0mm of bump est.`;
/** The roll-centre height the front-view sketch labels, in the page's units. */
export const rollCentreWords = (mm: number, units: UnitSystem) => length(mm, units).replace('\u00a0', ' ');
const signed = (n: number, decimals: number) => `${n < 0 ? '−' : n > 0 ? '+' : ''}${formatNumber(Math.abs(n), { decimals })}`;

/** The chosen figures in one unit system, or null when the owner chose none or none can be worked out. */
export function shownEngineering(build: Source, units: UnitSystem): ShownEngineering | null {
  const figures: ShownEngineeringFigure[] = [];
  let brakes: BrakeFigures | null = null;
  let geometry: FrontGeometryFigures | null = null;
  if (build.sections.brakes?.showFigures) {
    const b = brakeFigures(build.sections.brakes);
    if (b.status === 'ok') {
      brakes = b.value;
      figures.push({ key: 'brakeSplit', label: 'Brake split', value: `${formatNumber(b.value.frontPercent, { decimals: 0 })}\u00a0% front / ${formatNumber(b.value.rearPercent, { decimals: 0 })}\u00a0% rear est.` });
    }
  }
  const chassis = build.sections.chassis;
  if (chassis?.showFigures) {
    const g = frontGeometryFigures(chassis);
    if (g.status === 'ok') {
      const rc = g.value.centres.rollCentreHeightMm;
      const gain = g.value.curve.camberGainPer25MmBumpDeg;
      if (rc !== null) figures.push({ key: 'rollCentre', label: 'Front roll-centre height', value: `${length(rc, units)} est.` });
      if (gain !== null) figures.push({ key: 'camberGain', label: 'Front camber gain', value: camberGainWords(gain, units) });
      if (rc !== null || gain !== null) geometry = g.value;
    }
    const cg = cgHeightFigures(chassis, build.weighIns);
    if (cg.status === 'ok') figures.push({ key: 'cgHeight', label: 'Centre-of-gravity height', value: `${length(cg.value.cgHeight, units)} est.` });
  }
  return figures.length ? { figures, caution: ENGINEERING_CAUTION, brakes, geometry } : null;
}
