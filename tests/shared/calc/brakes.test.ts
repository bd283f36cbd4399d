import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CalcInputError } from '@shared/calc/errors';
import { convert } from '@shared/calc/units';
import {
  brakeSystem,
  brakeTorqueNm,
  clampForceN,
  effectiveRadiusMm,
  linePressureBar,
  masterTravelPerMmOfPistonTravel,
  proportionedPressureBar,
  pushrodForceN,
  type BrakeSystemInput,
} from '@shared/calc/brakes';

const IN = 25.4;
const psiToBar = (psi: number) => convert('pressure', psi, 'psi', 'bar');

describe('line pressure', () => {
  it('10 lbf on a 5/8 in bore gives 32.6 psi', () => {
    // Worked example: Sportsterpedia, "Master cylinder and caliper relationship": P = F ÷ A,
    // 10 lbf ÷ 0.3066 in² = 32.6 psi.
    const pushrod = convert('force', 10, 'lbf', 'N');
    const p = linePressureBar(pushrod, { kind: 'single', boreMm: (5 / 8) * IN });
    expect(convert('pressure', p.front, 'bar', 'psi')).toBeCloseTo(32.6, 1);
    expect(p.rear).toBe(p.front);
  });

  it('pedal force × pedal ratio × booster assist is the pushrod force', () => {
    // Lever and booster in series (Puhn, "Brake Handbook", pedal ratio chapter; from memory):
    // 400 N × 6 = 2400 N; a 2:1 booster doubles it. 2400 N on a 22.2 mm bore (387.08 mm²) = 62.0 bar, worked by hand.
    expect(pushrodForceN({ pedalForceN: 400, pedalRatio: 6 })).toBe(2400);
    expect(pushrodForceN({ pedalForceN: 400, pedalRatio: 6, boosterAssist: 2 })).toBe(4800);
    expect(linePressureBar(2400, { kind: 'single', boreMm: 22.2 }).front).toBeCloseTo(62.0034, 3);
  });

  it('a balance bar splits the force between two cylinders, each giving its own pressure', () => {
    // Altair MotionView documentation, disk brake schematic: F_front = BB·F_MC, P_front = F_front ÷ A_front,
    // F_rear = (1 − BB)·F_MC. Worked by hand: 2400 N, 60 % front, 19.05 mm front bore → 50.52 bar;
    // 40 % on a 22.2 mm rear bore → 24.80 bar.
    const p = linePressureBar(2400, { kind: 'dual', frontBoreMm: 19.05, rearBoreMm: 22.2, frontShare: 0.6 });
    expect(p.front).toBeCloseTo(50.5222, 3);
    expect(p.rear).toBeCloseTo(24.8014, 3);
  });

  it('refuses a booster that reduces force and a balance bar at either end stop', () => {
    // Definitions: assist ≥ 1; a share of 0 or 1 would leave one circuit with no force.
    expect(() => pushrodForceN({ pedalForceN: 400, pedalRatio: 6, boosterAssist: 0.5 })).toThrow(CalcInputError);
    expect(() => linePressureBar(2400, { kind: 'dual', frontBoreMm: 19, rearBoreMm: 19, frontShare: 1 })).toThrow(/balanceFrontShare/);
    expect(() => linePressureBar(2400, { kind: 'single', boreMm: 0 })).toThrow(/masterBoreMm/);
  });
});

describe('proportioning valve', () => {
  it('passes pressure to the knee, then the slope of what is above it', () => {
    // Puhn, "Brake Handbook", proportioning valves (knee and slope; from memory). By hand:
    // knee 30 bar, slope 0.43, inlet 80 bar → 30 + 0.43 × 50 = 51.5 bar; below the knee unchanged.
    expect(proportionedPressureBar(80, { kneeBar: 30, slope: 0.43 })).toBeCloseTo(51.5, 10);
    expect(proportionedPressureBar(20, { kneeBar: 30, slope: 0.43 })).toBe(20);
    expect(() => proportionedPressureBar(80, { kneeBar: 30, slope: 1.2 })).toThrow(/valveSlope/);
  });

  it('never raises the pressure and never lowers it below the knee (property)', () => {
    // Property of any valve of this shape.
    fc.assert(
      fc.property(fc.double({ min: 0, max: 300, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), fc.double({ min: 0.05, max: 1, noNaN: true }), (p, knee, slope) => {
        const out = proportionedPressureBar(p, { kneeBar: knee, slope });
        return out <= p + 1e-9 && out >= Math.min(p, knee) - 1e-9;
      }),
    );
  });
});

describe('clamp force', () => {
  it('a floating caliper clamps with its piston area; an opposed one with one side’s pistons', () => {
    // Pro-Touring forum, "master cylinder sizes?", quoting Camaro Performers (Winter 2002): compare
    // only one side's bore area of a four-piston caliper with a single-piston floating one.
    // By hand: a 2.75 in piston has 5.94 in², so 1000 psi clamps 5940 lbf; 2 × 1.75 in per side is 4.81 in².
    const floating = clampForceN(psiToBar(1000), { kind: 'floating', pistonDiametersMm: [2.75 * IN] });
    expect(convert('force', floating, 'N', 'lbf')).toBeCloseTo(5939.57, 1);
    const opposed = clampForceN(psiToBar(1000), { kind: 'opposed', pistonDiametersPerSideMm: [1.75 * IN, 1.75 * IN] });
    expect(convert('force', opposed, 'N', 'lbf')).toBeCloseTo(4810.56, 1);
  });

  it('names the piston that is zero', () => {
    expect(() => clampForceN(50, { kind: 'opposed', pistonDiametersPerSideMm: [40, 0] })).toThrow(/pistonDiametersPerSideMm\[1\]/);
  });
});

describe('effective radius', () => {
  it('mean radius (the default) and uniform pressure for a 300 mm rotor and a 50 mm pad', () => {
    // Shigley, "Mechanical Engineering Design", annular-pad disc brake (from memory): uniform wear gives
    // (ro + ri)/2 = 125 mm; uniform pressure 2/3·(150³ − 100³)/(150² − 100²) = 126.667 mm, by hand.
    expect(effectiveRadiusMm({ rotorDiameterMm: 300, padHeightMm: 50 })).toBe(125);
    expect(effectiveRadiusMm({ rotorDiameterMm: 300, padHeightMm: 50, model: 'uniform-pressure' })).toBeCloseTo(126.6667, 4);
  });

  it('refuses a pad as tall as the rotor radius', () => {
    // The bad input: the pad would reach past the hub.
    expect(() => effectiveRadiusMm({ rotorDiameterMm: 300, padHeightMm: 150 })).toThrow(/padHeightMm/);
  });

  it('uniform pressure is never below the mean radius and both lie on the pad (property)', () => {
    // Property: the uniform-pressure centroid weights the outer, longer arcs more.
    fc.assert(
      fc.property(fc.double({ min: 150, max: 500, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (d, share) => {
        const pad = (d / 2) * share;
        const mean = effectiveRadiusMm({ rotorDiameterMm: d, padHeightMm: pad });
        const up = effectiveRadiusMm({ rotorDiameterMm: d, padHeightMm: pad, model: 'uniform-pressure' });
        return up >= mean - 1e-9 && up <= d / 2 + 1e-9 && mean >= d / 2 - pad;
      }),
    );
  });
});

describe('torque and split', () => {
  it('torque per wheel is 2·μ·F·r_eff', () => {
    // Limpert, "Brake Design and Safety", disc brake torque, two friction faces (from memory). By hand:
    // 2 × 0.4 × 10 000 N × 0.125 m = 1000 N·m.
    expect(brakeTorqueNm({ padMu: 0.4, clampForceN: 10_000, effectiveRadiusMm: 125 })).toBeCloseTo(1000, 10);
  });

  const car: BrakeSystemInput = {
    pedalForceN: 400,
    pedalRatio: 6,
    master: { kind: 'single', boreMm: 22.2 },
    front: { caliper: { kind: 'opposed', pistonDiametersPerSideMm: [38, 38] }, padMu: 0.45, rotorDiameterMm: 330, padHeightMm: 50 },
    rear: { caliper: { kind: 'floating', pistonDiametersMm: [38] }, padMu: 0.4, rotorDiameterMm: 300, padHeightMm: 40 },
  };

  it('works the whole chain: a larger front caliper and rotor take most of the torque', () => {
    // By hand: 62.0 bar on 2 × 1134.1 mm² = 14 064 N; r = 140 mm; 2 × 0.45 × 14 064 × 0.140 = 1772 N·m.
    // Rear 7032 N, r = 130 mm, 2 × 0.4 × 7032 × 0.130 = 731.3 N·m; front share 1772 / 2503.4 = 70.8 %.
    const r = brakeSystem(car);
    expect(r.radiusModel).toBe('mean');
    expect(r.front.clampForceN).toBeCloseTo(14_064.2, 0);
    expect(r.front.torquePerWheelNm).toBeCloseTo(1772.1, 0);
    expect(r.rear.torquePerWheelNm).toBeCloseTo(731.35, 0);
    expect(r.frontPercent).toBeCloseTo(70.79, 1);
  });

  it('a proportioning valve moves the split forward', () => {
    // Follows from the valve lowering only the rear pressure.
    const plain = brakeSystem(car);
    const valved = brakeSystem({ ...car, valve: { kneeBar: 30, slope: 0.43 } });
    expect(valved.rear.linePressureBar).toBeCloseTo(30 + 0.43 * (62.0034 - 30), 3);
    expect(valved.frontPercent).toBeGreaterThan(plain.frontPercent);
  });

  it('front and rear always sum to 100 % and are each between 0 and 100 (property)', () => {
    // Property: a split is a share of one total.
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 1000, noNaN: true }),
        fc.double({ min: 15, max: 30, noNaN: true }),
        fc.double({ min: 20, max: 60, noNaN: true }),
        fc.double({ min: 20, max: 60, noNaN: true }),
        fc.double({ min: 0.2, max: 0.8, noNaN: true }),
        (pedal, bore, fp, rp, mu) => {
          const r = brakeSystem({
            ...car,
            pedalForceN: pedal,
            master: { kind: 'single', boreMm: bore },
            front: { ...car.front, padMu: mu, caliper: { kind: 'opposed', pistonDiametersPerSideMm: [fp] } },
            rear: { ...car.rear, caliper: { kind: 'floating', pistonDiametersMm: [rp] } },
          });
          return Math.abs(r.frontPercent + r.rearPercent - 100) < 1e-9 && r.frontPercent > 0 && r.frontPercent < 100;
        },
      ),
    );
  });

  it('names the axle and field of a bad input', () => {
    expect(() => brakeSystem({ ...car, rear: { ...car.rear, padHeightMm: 200 } })).toThrow(/rear\.padHeightMm/);
  });

  it('master cylinder travel per mm of piston travel is the area ratio', () => {
    // Pascal: volume in = volume out. By hand: front 2 wheels × 4 × 1134.1 = 9072.9 mm², rear 2 × 1134.1;
    // total 11 341.1 mm² ÷ 387.08 mm² = 29.30 mm of master travel per mm at every piston.
    const t = masterTravelPerMmOfPistonTravel({ master: car.master, front: car.front.caliper, rear: car.rear.caliper });
    expect(t).toBeCloseTo(29.3, 1);
  });
});
