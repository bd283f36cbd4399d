import { describe, expect, it } from 'vitest';
import { specWarnings } from '@client/features/builds/model/numbers/spec-input';
import type { Sections } from '@shared/schemas/build-sections';

// The editor's spec check: the build sheet mapped onto shared/calc's specCheck, each warning placed on its field.
const sections = (topSpeedKmh: number): Sections => ({
  engine: { revLimit: 7000 },
  drivetrain: { gears: [2.66, 1.78, 1.3, 1.0, 0.8, 0.63], finalDrive: 3.55, topSpeed: { value: topSpeedKmh, unit: 'km/h', provenance: 'estimated' } },
  wheels: { front: { tyreSize: '275/35R18' }, rear: { tyreSize: '315/30R18' } },
});

describe('spec check in the editor', () => {
  it('flags a claimed top speed the gearing cannot reach, on the drivetrain top-speed field', () => {
    // 315/30R18 is 25.44 in; 7000 rpm in 0.63 × 3.55 gives 7000 × 25.44 / (0.63 × 3.55 × 336.135) ≈ 237 mph ≈ 381 km/h.
    const warnings = specWarnings(sections(450), {});
    const top = warnings.find((w) => w.code === 'top_speed_beyond_gearing');
    expect(top).toMatchObject({ form: 'drivetrain', path: 'topSpeed' });
  });

  it('says nothing when the claim is within reach', () => {
    expect(specWarnings(sections(300), {}).find((w) => w.code === 'top_speed_beyond_gearing')).toBeUndefined();
  });
});
