import { describe, expect, it } from 'vitest';
import { CalcInputError } from '@shared/calc/errors';
import {
  DRIVETRAIN_LOSS,
  flywheelPowerFromWheel,
  impliedDrivetrainLoss,
  powerToWeight,
  wheelPowerFromFlywheel,
} from '@shared/calc/power';

describe('power-to-weight', () => {
  it('450 hp, 3200 lb → 7.11111 lb/hp', () => {
    // Definition: 3200 / 450.
    const p = powerToWeight({ value: 450, unit: 'hp' }, { value: 3200, unit: 'lb' });
    expect(p.lbPerHp).toBeCloseTo(7.11111, 5);
  });

  it('1000 kg with 800 hp at the wheels → 800 hp per tonne', () => {
    // Definition: 800 hp / 1.000 t.
    const p = powerToWeight({ value: 800, unit: 'hp' }, { value: 1000, unit: 'kg' });
    expect(p.hpPerTonne).toBeCloseTo(800, 10);
    // 800 hp = 596.56 kW (NIST SP 811 B.8) → 596.56 W/kg and 1.6763 kg/kW.
    expect(p.wPerKg).toBeCloseTo(596.559897, 5);
    expect(p.kgPerKw).toBeCloseTo(1 / 0.596559897, 6);
    // In metric hp: 800 × 745.69987 / 735.49875 = 811.0957 PS (NIST SP 811 B.8).
    expect(p.psPerTonne).toBeCloseTo(811.0957, 3);
  });

  it('rejects zero mass and zero power', () => {
    // Our input rule: a ratio over zero mass or zero power means nothing.
    expect(() => powerToWeight({ value: 450, unit: 'hp' }, { value: 0, unit: 'kg' })).toThrow(
      CalcInputError,
    );
    expect(() => powerToWeight({ value: 0, unit: 'kW' }, { value: 1000, unit: 'kg' })).toThrow(
      /power/,
    );
  });
});

describe('flywheel ↔ wheel power', () => {
  it('defaults to a 15% loss, marked as an estimate in the 10–20% range', () => {
    // Common practice (no formal source).
    expect(DRIVETRAIN_LOSS.manualRearDrive).toBe(0.15);
    expect([DRIVETRAIN_LOSS.typicalMin, DRIVETRAIN_LOSS.typicalMax]).toEqual([0.1, 0.2]);
    const w = wheelPowerFromFlywheel({ value: 400, unit: 'hp' });
    expect(w).toMatchObject({ unit: 'hp', lossFraction: 0.15, isEstimate: true });
    expect(w.value).toBeCloseTo(340, 10);
    expect(w.note).toMatch(/Estimate/);
  });

  it('divides by (1 − L) going back, rather than multiplying by (1 + L)', () => {
    // Definition of a loss as a share of flywheel power: 340 / 0.85 = 400, not 340 × 1.15 = 391.
    const f = flywheelPowerFromWheel({ value: 340, unit: 'hp' });
    expect(f.value).toBeCloseTo(400, 10);
    expect(f.value).not.toBeCloseTo(391, 0);
    expect(flywheelPowerFromWheel({ value: 250, unit: 'kW' }, 0.2).value).toBeCloseTo(312.5, 10);
  });

  it('infers the loss between a rating and a dyno figure', () => {
    // Definition: 1 − 340/400 = 0.15; with units mixed, 253.5 kW at the wheels of a 400 hp car.
    expect(
      impliedDrivetrainLoss({ value: 400, unit: 'hp' }, { value: 340, unit: 'hp' }),
    ).toBeCloseTo(0.15, 12);
    expect(
      impliedDrivetrainLoss({ value: 400, unit: 'hp' }, { value: 253.5, unit: 'kW' }),
    ).toBeCloseTo(1 - 253.5 / 298.279949, 6);
  });

  it('rejects a loss of 100% or more, and a negative one', () => {
    // Our input rule: 1 − L must stay above zero, and a loss cannot add power.
    expect(() => flywheelPowerFromWheel({ value: 340, unit: 'hp' }, 1)).toThrow(CalcInputError);
    expect(() => flywheelPowerFromWheel({ value: 340, unit: 'hp' }, -0.1)).toThrow(CalcInputError);
    expect(() => wheelPowerFromFlywheel({ value: Number.NaN, unit: 'hp' })).toThrow(CalcInputError);
  });
});
