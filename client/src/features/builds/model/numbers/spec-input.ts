import { specCheck, type Figure, type SpecCheckInput, type SpecWarning } from '@shared/calc';
import type { Sections } from '@shared/schemas/build-sections';
import { engineeringChecks } from '@shared/build-sheet/engineering-checks';
import type { FigureInput } from '@shared/schemas/figure';
import type { FormKey } from '../form-keys';

export type Overview = { weight?: FigureInput | null; frontWeightPercent?: number; weighIns?: Parameters<typeof engineeringChecks>[1]['weighIns'] };

const inches = (value: number | undefined): Figure | undefined => (value === undefined ? undefined : { value, unit: 'in', provenance: 'estimated' });

/** The build sheet's sections mapped onto the spec check's input. */
export function toSpecInput(sections: Sections, overview: Overview): SpecCheckInput {
  const { engine, drivetrain, wheels } = sections;
  const end = (w: NonNullable<Sections['wheels']>['front']) =>
    w ? { tyre: w.tyreSize, rimWidth: inches(w.rimWidthIn), offset: w.offset, backspacing: w.backspacing } : undefined;
  return {
    engine: engine && {
      bore: engine.bore,
      stroke: engine.stroke,
      cylinders: engine.cylinders,
      displacement: engine.displacement,
      flywheelPower: engine.flywheelPower,
      wheelPower: engine.wheelPower,
      torque: engine.flywheelTorque ?? engine.wheelTorque,
      revLimitRpm: engine.revLimit,
    },
    drivetrain: drivetrain && { gearRatios: drivetrain.gears, finalDrive: drivetrain.finalDrive },
    wheels: wheels && { front: end(wheels.front), rear: end(wheels.rear), raked: wheels.raked },
    chassis: overview.weight ? { weight: overview.weight } : undefined,
    performance: drivetrain?.topSpeed ? { topSpeed: drivetrain.topSpeed } : undefined,
  };
}

/** Where a warning shows in the editor: a form and a field path in that form. */
export type PlacedWarning = SpecWarning & { form: FormKey; path: string };

const FIELD_MAP: Record<string, [FormKey, string]> = {
  'engine.revLimitRpm': ['engine', 'revLimit'],
  'engine.torque': ['engine', 'flywheelTorque'],
  'chassis.weight': ['overview', 'weight'],
  'performance.topSpeed': ['drivetrain', 'topSpeed'],
  'wheels.front.tyre': ['wheels', 'front.tyreSize'],
  'wheels.rear.tyre': ['wheels', 'rear.tyreSize'],
  'wheels.front.rimWidth': ['wheels', 'front.rimWidthIn'],
  'wheels.rear.rimWidth': ['wheels', 'rear.rimWidthIn'],
};

function place(w: SpecWarning): PlacedWarning | null {
  const mapped = FIELD_MAP[w.field];
  if (mapped) return { ...w, form: mapped[0], path: mapped[1] };
  const gear = /^drivetrain\.gearRatios\.(\d+)$/.exec(w.field);
  if (gear) return { ...w, form: 'drivetrain', path: 'gears' };
  const [head, ...rest] = w.field.split('.');
  if (!head || !rest.length) return null;
  if (['overview', 'engine', 'drivetrain', 'chassis', 'brakes', 'wheels', 'body', 'extra'].includes(head)) return { ...w, form: head as FormKey, path: rest.join('.') };
  return null;
}

/**
 * The spec check on the mapped input, plus its "measured with no date" walk over every section
 * (the mapped input holds only the figures the other checks read).
 */
export function specWarnings(sections: Sections, overview: Overview): PlacedWarning[] {
  const main = specCheck(toSpecInput(sections, overview));
  const everywhere = specCheck({ ...sections, overview: { weight: overview.weight ?? undefined } } as unknown as SpecCheckInput).filter((w) => w.code === 'measured_without_date');
  const seen = new Set<string>();
  const placed: PlacedWarning[] = [];
  const engineering = engineeringChecks(sections, { weight: overview.weight, frontWeightPercent: overview.frontWeightPercent, weighIns: overview.weighIns });
  for (const w of [...main, ...engineering, ...everywhere]) {
    const p = place(w);
    if (!p) continue;
    const key = `${p.code}:${p.form}.${p.path}`;
    if (seen.has(key)) continue;
    seen.add(key);
    placed.push(p);
  }
  return placed;
}
