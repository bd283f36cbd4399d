import { describe, expect, it } from 'vitest';
import { BRAKE_TYPE_LABELS, FRAME_LABELS, LIMITED_SLIP_LABELS, PROVENANCE_MARKS, SPRING_LABELS, SUSPENSION_LABELS, TRANSMISSION_LABELS, inText } from '@shared/build-sheet/choice-labels';
import { BRAKE_TYPES, FRAME_KINDS, LIMITED_SLIP_TYPES, SPRING_TYPES, SUSPENSION_TYPES, TRANSMISSION_TYPES } from '@shared/schemas/build-sections';
import { provenanceMark, sectionViews } from '@shared/build-sheet/spec-lines';

describe('choice labels', () => {
  it('name every choice the schemas offer', () => {
    for (const [ids, labels] of [
      [BRAKE_TYPES, BRAKE_TYPE_LABELS],
      [FRAME_KINDS, FRAME_LABELS],
      [LIMITED_SLIP_TYPES, LIMITED_SLIP_LABELS],
      [SPRING_TYPES, SPRING_LABELS],
      [SUSPENSION_TYPES, SUSPENSION_LABELS],
      [TRANSMISSION_TYPES, TRANSMISSION_LABELS],
    ] as const) {
      expect(Object.keys(labels).sort()).toEqual([...ids].sort());
    }
  });

  it('read inside a sentence without losing capitals that matter', () => {
    expect(inText('Double-wishbone')).toBe('double-wishbone');
    expect(inText('CVT')).toBe('CVT');
    expect(inText('V')).toBe('V');
    expect(inText('A quarter')).toBe('a quarter');
  });

  it('are the words the public page and cards print', () => {
    expect(provenanceMark('estimated')).toBe(PROVENANCE_MARKS.estimated);
    const [chassis] = sectionViews({ chassis: { frame: 'custom', front: { type: 'double-wishbone', springType: 'torsion' } } }, 'metric', ['chassis']);
    expect(chassis!.rows).toEqual(
      expect.arrayContaining([
        { label: 'Frame', value: 'Custom tube frame' },
        { label: 'Front suspension', value: 'Double-wishbone, torsion bar' },
      ]),
    );
    const [drivetrain] = sectionViews({ drivetrain: { transmissionType: 'cvt', limitedSlip: 'electronic' } }, 'metric', ['drivetrain']);
    expect(drivetrain!.rows).toEqual(expect.arrayContaining([{ label: 'Transmission', value: 'CVT' }, { label: 'Differential', value: 'Electronic limited slip' }]));
  });
});
