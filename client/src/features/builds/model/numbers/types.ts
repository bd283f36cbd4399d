import type { UnitSystem } from '@shared/calc';
import type { Sections } from '@shared/schemas/build-sections';
import type { DynoRun, WeighIn } from '@shared/schemas/build';
import type { FigureInput } from '@shared/schemas/figure';

/**
 * One computed line: what it is, the figure in the chosen system, the other system beside it.
 * `estimate` marks a rule-of-thumb result; `provenance` carries the weakest input's word, since a
 * worked-out figure is only as firm as what it is worked out from.
 */
export type NumberRow = { label: string; value: string; other?: string; estimate?: boolean; provenance?: 'estimated' | 'target' };

export type NumberGroupId = 'engine' | 'power' | 'gearing' | 'tyres' | 'spacing' | 'suspension' | 'antiSquat' | 'tubes' | 'corners' | 'brakes' | 'frontGeometry' | 'cgHeight' | 'quarterMile';

export type NumberGroup = {
  id: NumberGroupId;
  title: string;
  /** Which editor section it belongs under on a phone. */
  section: 'engine' | 'drivetrain' | 'chassis' | 'brakes' | 'wheels' | 'weighIns' | 'overview';
  rows: NumberRow[];
  /** What is missing, when nothing can be worked out yet. */
  hint?: string;
  notes?: string[];
  caution?: boolean;
};

export type NumbersInput = {
  sections: Sections;
  weight?: FigureInput | null;
  weighIns: WeighIn[];
  dynoRuns: DynoRun[];
  system: UnitSystem;
  /** Cruising speed for the rpm-at-cruise line, in the chosen system's unit (km/h or mph). */
  cruise: number;
};

export const other = (system: UnitSystem): UnitSystem => (system === 'metric' ? 'imperial' : 'metric');
