import { engineNumbers, powerNumbers } from './engine-numbers';
import { gearingNumbers, spacingNumbers, tyreNumbers } from './wheel-numbers';
import { antiSquatNumbers, cornerNumbers, suspensionNumbers, tubeNumbers } from './chassis-numbers';
import { specWarnings, type PlacedWarning } from './spec-input';
import { frontWeightPercent, brakeNumbers, cgNumbers, frontGeometryNumbers, quarterMileNumbers } from './engineering-numbers';
import type { NumberGroup, NumbersInput } from './types';

import { brakeFigures, frontGeometryFigures, type BrakeFigures, type FrontGeometryFigures } from '@shared/build-sheet/engineering-figures';

/** What the diagrams draw: the same figures as the rows beside them. */
export type Diagrams = { brakes?: BrakeFigures; geometry?: FrontGeometryFigures };
export type Numbers = { groups: NumberGroup[]; warnings: PlacedWarning[]; diagrams: Diagrams };

/** Everything the numbers panel shows, from the forms' live values. Never throws on what an owner types. */
export function computeNumbers(input: NumbersInput): Numbers {
  const groups = [engineNumbers, powerNumbers, gearingNumbers, tyreNumbers, spacingNumbers, suspensionNumbers, antiSquatNumbers, frontGeometryNumbers, cgNumbers, tubeNumbers, cornerNumbers, brakeNumbers, quarterMileNumbers].map((fn) => fn(input));
  let warnings: PlacedWarning[] = [];
  try {
    warnings = specWarnings(input.sections, { weight: input.weight, frontWeightPercent: frontWeightPercent(input), weighIns: input.weighIns });
  } catch {
    // The spec check is meant never to throw; if a half-typed value slips through, show no warnings rather than break the editor.
  }
  const b = brakeFigures(input.sections.brakes);
  const g = frontGeometryFigures(input.sections.chassis);
  const diagrams: Diagrams = { ...(b.status === 'ok' ? { brakes: b.value } : {}), ...(g.status === 'ok' ? { geometry: g.value } : {}) };
  return { groups, warnings, diagrams };
}
