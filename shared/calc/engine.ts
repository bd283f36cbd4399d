// Swept volume of a piston engine, by definition π/4 × bore² × stroke × cylinders.
import { finiteResult, requirePositive, requirePositiveInteger } from './errors';
import { UNITS } from './units';

export interface BoreStroke {
  bore: number;
  stroke: number;
  /** The unit of both bore and stroke. */
  unit: 'mm' | 'in';
  cylinders: number;
}

export interface Displacement {
  cm3: number;
  litres: number;
  in3: number;
}

export function displacement({ bore, stroke, unit, cylinders }: BoreStroke): Displacement {
  requirePositive(bore, 'bore');
  requirePositive(stroke, 'stroke');
  requirePositiveInteger(cylinders, 'cylinders');
  const swept = (Math.PI / 4) * bore * bore * stroke * cylinders;
  // Work in the unit given so that inch engines give exact in³ and metric ones exact cm³.
  if (unit === 'in') {
    const in3 = finiteResult(swept, 'displacement');
    const cm3 = finiteResult(in3 * UNITS.volume.in3, 'displacement');
    return { cm3, litres: cm3 / 1000, in3 };
  }
  const cm3 = finiteResult(swept / 1000, 'displacement'); // mm³ → cm³
  return { cm3, litres: cm3 / 1000, in3: cm3 / UNITS.volume.in3 };
}

/** Bore ÷ stroke: above 1 is "oversquare" (short stroke), below 1 "undersquare". */
export function boreStrokeRatio(bore: number, stroke: number): number {
  requirePositive(bore, 'bore');
  requirePositive(stroke, 'stroke');
  return finiteResult(bore / stroke, 'boreStrokeRatio');
}
