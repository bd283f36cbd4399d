import { describe, expect, it } from 'vitest';
import { PUBLIC_SECTION_SCHEMAS, publicSection, publicSections, publicWeight } from '@shared/schemas/public-build-sections';
import { PRIVATE_FIELD_NAMES } from '@shared/schemas/build';
import { SECTION_KINDS } from '@shared/schemas/build-sections';

describe('public section schemas', () => {
  it('name no private field, in any section', () => {
    for (const kind of SECTION_KINDS) {
      const keys = Object.keys(PUBLIC_SECTION_SCHEMAS[kind].shape);
      for (const field of PRIVATE_FIELD_NAMES) expect(keys, `${kind} names ${field}`).not.toContain(field);
    }
  });

  it('drop keys they do not name, nested ones too', () => {
    const engine = publicSection('engine', { cylinders: 8, vin: 'X', flywheelPower: { value: 400, unit: 'hp', provenance: 'estimated', plate: 'Y' }, madeBy: { kind: 'owner', ownerPhone: 'Z' } });
    expect(engine).toEqual({ cylinders: 8, flywheelPower: { value: 400, unit: 'hp', provenance: 'estimated' }, madeBy: { kind: 'owner' } });
    expect(publicSection('extra', { lines: [{ label: 'Fuel cell', value: '16 gal', ownerAddress: 'A' }] })).toEqual({ lines: [{ label: 'Fuel cell', value: '16 gal' }] });
  });

  it('leave out only the field today’s rules refuse, and skip a section that is not an object', () => {
    // 40 cylinders is past today's limit (16): that field goes, the rest stays.
    expect(publicSection('engine', { cylinders: 40, fuel: 'E85' })).toEqual({ fuel: 'E85' });
    expect(publicSection('engine', 'not a section')).toBeUndefined();
    expect(publicSections([{ kind: 'body', data: { paint: 'Oxblood', secret: 1 } }, { kind: 'nonsense' as never, data: {} }])).toEqual({ body: { paint: 'Oxblood' } });
  });

  it('read the weight as a figure or not at all', () => {
    expect(publicWeight({ value: 1500, unit: 'kg', provenance: 'measured', vin: 'X' })).toEqual({ value: 1500, unit: 'kg', provenance: 'measured' });
    expect(publicWeight(null)).toBeNull();
    expect(publicWeight({ value: 'heavy' })).toBeNull();
  });
});
