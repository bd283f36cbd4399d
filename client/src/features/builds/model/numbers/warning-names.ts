import { FORM_LABELS, type FormKey } from '../form-keys';
import type { PlacedWarning } from './spec-input';

// The editor's own words for the figures the spec check reads (as their boxes are labelled).
const FIELD_NAMES: Partial<Record<FormKey, Record<string, string>>> = {
  overview: { weight: 'weight' },
  engine: {
    bore: 'bore',
    stroke: 'stroke',
    cylinders: 'cylinders',
    displacement: 'displacement',
    flywheelPower: 'flywheel power',
    flywheelTorque: 'flywheel torque',
    wheelPower: 'wheel power',
    wheelTorque: 'wheel torque',
    revLimit: 'rev limit',
    boost: 'boost',
  },
  drivetrain: { gears: 'gear ratios', finalDrive: 'final drive', topSpeed: 'top speed' },
  wheels: { tyreSize: 'tyre size', rimWidthIn: 'rim width', offset: 'offset', backspacing: 'backspacing' },
  brakes: { rotorDiameter: 'rotor or drum diameter' },
};
const ENDS: Record<string, string> = { front: 'front', rear: 'rear' };

/** "cornerSprungMass" → "corner sprung mass": for a figure the list above does not name. */
const words = (key: string) => key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();

/** "Wheels and tyres · rear tyre size": the section and the field a spec-check message is about. */
export function warningFieldName(form: FormKey, path: string): string {
  const names = FIELD_NAMES[form] ?? {};
  const parts = path.split('.');
  const row = parts.find((p) => /^\d+$/.test(p));
  const named = parts.filter((p) => !/^\d+$/.test(p)).map((p) => ENDS[p] ?? names[p] ?? words(p));
  return `${FORM_LABELS[form]} · ${named.join(' ')}${row !== undefined ? ` (line ${Number(row) + 1})` : ''}`;
}

export type WarningGroup = { why: string; items: { key: string; field: string; message: string }[] };

/** Warnings that share an explanation are listed together under it, so each explanation is said once. */
export function groupWarnings(warnings: PlacedWarning[]): WarningGroup[] {
  const groups = new Map<string, WarningGroup>();
  for (const w of warnings) {
    const group = groups.get(w.why) ?? { why: w.why, items: [] };
    group.items.push({ key: `${w.code}-${w.form}-${w.path}`, field: warningFieldName(w.form, w.path), message: w.message });
    groups.set(w.why, group);
  }
  return [...groups.values()];
}
