// Mass per length of steel tube from its cross-section area × density.
// Round: A = π·t·(OD − t). Rectangular with sharp corners: A = 2t·(B + H − 2t), the outer
// rectangle minus the inner one. Real rectangular tube has radiused corners and is slightly
// lighter than this. (Some published forms of the rectangular formula count each wall twice:
// this is the area of steel, once.)
import { CalcInputError, finiteResult, requirePositive } from './errors';
import { convert, type Quantity } from './units';

/** Carbon steel, the usual figure: 7850 kg/m³ (≈ 0.2836 lb/in³). */
export const STEEL_DENSITY: Quantity<'density'> = { value: 7850, unit: 'kg/m3' };

export const TUBE_CORNER_NOTE =
  'Sharp-corner figure: real rectangular tube has radiused corners and weighs slightly less.';

export interface TubeMass {
  kgPerM: number;
  lbPerFt: number;
  /** Cross-section area of steel, in the square of the input length unit. */
  area: number;
}

export interface RoundTubeInput {
  outsideDiameter: number;
  wall: number;
  unit: 'mm' | 'in';
  density?: Quantity<'density'>;
}

export interface RectangularTubeInput {
  width: number;
  height: number;
  wall: number;
  unit: 'mm' | 'in';
  density?: Quantity<'density'>;
}

export function roundTubeMassPerLength(input: RoundTubeInput): TubeMass {
  const od = requirePositive(input.outsideDiameter, 'outsideDiameter');
  const wall = requirePositive(input.wall, 'wall');
  // A wall of half the diameter is a solid bar; more is not a tube.
  if (wall > od / 2) throw new CalcInputError('wall', 'is more than half the outside diameter');
  return massFromArea(Math.PI * wall * (od - wall), input.unit, input.density);
}

export function rectangularTubeMassPerLength(
  input: RectangularTubeInput,
): TubeMass & { note: string } {
  const width = requirePositive(input.width, 'width');
  const height = requirePositive(input.height, 'height');
  const wall = requirePositive(input.wall, 'wall');
  if (wall > Math.min(width, height) / 2) {
    throw new CalcInputError('wall', 'is more than half the smaller side');
  }
  const area = 2 * wall * (width + height - 2 * wall);
  return { ...massFromArea(area, input.unit, input.density), note: TUBE_CORNER_NOTE };
}

function massFromArea(area: number, unit: 'mm' | 'in', density = STEEL_DENSITY): TubeMass {
  requirePositive(density.value, 'density');
  finiteResult(area, 'area');
  const metresPerUnit = convert('length', 1, unit, 'm');
  const areaM2 = area * metresPerUnit ** 2;
  const kgPerM3 = convert('density', density.value, density.unit, 'kg/m3');
  const kgPerM = finiteResult(areaM2 * kgPerM3, 'kgPerM');
  return { kgPerM, lbPerFt: convert('massPerLength', kgPerM, 'kg/m', 'lb/ft'), area };
}
