import { describe, expect, it } from 'vitest';
import { specWarnings } from '@client/features/builds/model/numbers/spec-input';
import { groupWarnings, warningFieldName } from '@client/features/builds/model/numbers/warning-names';
import type { Sections } from '@shared/schemas/build-sections';

// The numbers panel's spec-check list: each message names its section and field; an explanation is said once.
describe('spec-check messages in the editor', () => {
  it('name the section and the field', () => {
    expect(warningFieldName('engine', 'flywheelPower')).toBe('Engine · flywheel power');
    expect(warningFieldName('wheels', 'rear.tyreSize')).toBe('Wheels and tyres · rear tyre size');
    expect(warningFieldName('chassis', 'front.cornerSprungMass')).toBe('Chassis and suspension · front corner sprung mass');
    expect(warningFieldName('chassis', 'tubes.2.wall')).toBe('Chassis and suspension · tubes wall (line 3)');
  });

  it('list every undated measured figure by name, with the explanation once', () => {
    const measured = <U extends string>(value: number, unit: U) => ({ value, unit, provenance: 'measured' as const });
    const sections: Sections = { engine: { flywheelPower: measured(410, 'hp'), flywheelTorque: measured(430, 'lbft') } };
    const groups = groupWarnings(specWarnings(sections, { weight: { value: 1300, unit: 'kg', provenance: 'measured' } }));
    const undated = groups.filter((g) => g.items.some((i) => i.message === 'This measured figure has no date.'));
    expect(undated).toHaveLength(1);
    expect(undated[0]!.items.map((i) => i.field)).toEqual(['Engine · flywheel power', 'Engine · flywheel torque', 'Overview · weight']);
    expect(undated[0]!.why).toMatch(/^A measured figure means more with the day it was measured/);
  });
});
