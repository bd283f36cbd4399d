import { engineNumbers, powerNumbers } from './engine-numbers';
import { gearingNumbers, spacingNumbers, tyreNumbers } from './wheel-numbers';
import { antiSquatNumbers, cornerNumbers, suspensionNumbers, tubeNumbers } from './chassis-numbers';
import { specWarnings, type PlacedWarning } from './spec-input';
import type { NumberGroup, NumbersInput } from './types';

export type Numbers = { groups: NumberGroup[]; warnings: PlacedWarning[] };

/** Everything the numbers panel shows, from the forms' live values. Never throws on what an owner types. */
export function computeNumbers(input: NumbersInput): Numbers {
  const groups = [engineNumbers, powerNumbers, gearingNumbers, tyreNumbers, spacingNumbers, suspensionNumbers, antiSquatNumbers, tubeNumbers, cornerNumbers].map((fn) => fn(input));
  let warnings: PlacedWarning[] = [];
  try {
    warnings = specWarnings(input.sections, { weight: input.weight });
  } catch {
    // The spec check is meant never to throw; if a half-typed value slips through, show no warnings rather than break the editor.
  }
  return { groups, warnings };
}
