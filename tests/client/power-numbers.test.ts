import { describe, expect, it } from 'vitest';
import { powerNumbers } from '@client/features/builds/model/numbers/engine-numbers';

const hp = (value: number) => ({ value, unit: 'hp' as const, provenance: 'measured' as const, measuredOn: '2026-05-02' });
const group = (flywheel: number, wheel: number) => powerNumbers({ sections: { engine: { flywheelPower: hp(flywheel), wheelPower: hp(wheel) } }, weighIns: [], dynoRuns: [], system: 'imperial', cruise: 60 });

describe('the power numbers in the editor', () => {
  it('gives the drivetrain loss two figures imply', () => {
    // (200 − 170) / 200 = 15 % (definition of drivetrain loss as a share of flywheel power).
    expect(group(200, 170).rows).toContainEqual(expect.objectContaining({ label: 'Drivetrain loss the two figures imply', value: '15.0%' }));
  });

  it('never shows a negative loss as a figure: it says one of the two powers is wrong', () => {
    const g = group(200, 250);
    expect(g.rows.map((r) => r.label)).not.toContain('Drivetrain loss the two figures imply');
    expect(g.rows.map((r) => r.value).join(' ')).not.toMatch(/-|−/);
    expect(g.notes).toContain('No drivetrain loss to show: the wheel power is above the flywheel power, so one of the two is wrong.');
  });
});
