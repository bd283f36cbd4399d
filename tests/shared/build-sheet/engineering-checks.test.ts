import { describe, expect, it } from 'vitest';
import { engineeringChecks, MASTER_TRAVEL_WINDOW } from '@shared/build-sheet/engineering-checks';
import { brakeFigures, cgHeightFigures, pistonDiameters } from '@shared/build-sheet/engineering-figures';
import { shownEngineering } from '@shared/build-sheet/engineering-shown';
import type { BrakesSection, ChassisSection, Sections } from '@shared/schemas/build-sections';
import type { SpecWarning } from '@shared/calc';

const est = <U extends string>(value: number, unit: U) => ({ value, unit, provenance: 'estimated' as const });

// The brake chain of tests/shared/calc/brakes.test.ts ("works the whole chain"): 70.8 % of the torque in front;
// the master cylinder moves every piston 1 mm in 29.3 mm (11,341 mm² of pistons on a 387 mm² bore, by hand).
const BRAKES: BrakesSection = {
  front: { type: 'disc', rotorDiameter: est(330, 'mm'), caliperKind: 'opposed', pistonDiametersMm: [38, 38], padHeightMm: 50, padMu: 0.45 },
  rear: { type: 'disc', rotorDiameter: est(300, 'mm'), caliperKind: 'floating', pistonDiametersMm: [38], padHeightMm: 40, padMu: 0.4 },
  hydraulics: { pedalRatio: 6, masterBoreMm: 22.2, pedalForce: est(400, 'N') },
};

type Pt = [number, number];
const geometry = (ui: Pt, uo: Pt, li: Pt, lo: Pt, wheelCentreHeightMm = 330): ChassisSection => ({
  front: { geometry: { upperInner: { x: ui[0], y: ui[1] }, upperOuter: { x: uo[0], y: uo[1] }, lowerInner: { x: li[0], y: li[1] }, lowerOuter: { x: lo[0], y: lo[1] }, contactPatchXMm: 760, wheelCentreHeightMm } },
});
// The worked example of tests/shared/calc/front-geometry.test.ts: roll centre 102 mm up, camber −0.85° per 25 mm of bump.
const GOOD_GEOMETRY = geometry([420, 440], [660, 470], [300, 180], [700, 160]);

const codes = (ws: SpecWarning[]) => ws.map((w) => w.code);
const only = (ws: SpecWarning[], code: SpecWarning['code']) => {
  const found = ws.filter((w) => w.code === code);
  expect(found).toHaveLength(1);
  return found[0]!;
};

/** Words an owner reads: no NaN, no code names or dotted paths, and a "check" to act on. */
function readsAsPlainWords(w: SpecWarning) {
  for (const text of [w.message, w.why]) {
    expect(text).not.toMatch(/NaN|Infinity|undefined|null|\w+\.\w+[A-Z]\w*|_/);
    expect(text.trim()).toMatch(/[.!]$/);
  }
  expect(w.why).toMatch(/Check/);
}

describe('brake split against the weight distribution (window: common practice)', () => {
  it('says nothing with the split inside the window', () => {
    // 55 % front weight, no CG height: 55 … 100 (capped at 95) % is allowed; 70.8 % is inside.
    expect(codes(engineeringChecks({ brakes: BRAKES }, { frontWeightPercent: 55 }))).toEqual([]);
  });

  it('warns when the front brakes do less than the front weight: rear wheels lock first', () => {
    const w = only(engineeringChecks({ brakes: BRAKES }, { frontWeightPercent: 75 }), 'brake_split_outside_window');
    expect(w.message).toBe('The front brakes take 70.8 % of the torque; with 75.0 % of the weight in front, a sensible window is 75.0–95.0 %.');
    expect(w.why).toMatch(/rear wheels lock first/);
    expect(w.field).toBe('brakes.hydraulics.balanceFrontPercent');
    readsAsPlainWords(w);
  });

  it('warns when the front does far more than the weight moving forward allows: long stops', () => {
    // 20 % front and no CG height: the window is 20 … 20 + 35 + 10 = 65 %; 70.8 % is past it.
    const w = only(engineeringChecks({ brakes: BRAKES }, { frontWeightPercent: 20 }), 'brake_split_outside_window');
    expect(w.message).toMatch(/sensible window is 20\.0–65\.0 %/);
    expect(w.why).toMatch(/rears doing little/);
    readsAsPlainWords(w);
  });

  it('uses the CG height from a tilted weigh-in for the weight moving forward', () => {
    // h/L = 500/2500 = 20 points of transfer at 1 g: with 45 % in front the window is 45 … 75 %; 70.8 % is inside.
    // Without the CG height the 35-point allowance would also pass; at 40 % front, 40 + 20 + 10 = 70 < 70.8 warns only with h.
    const chassis: ChassisSection = { wheelbase: est(2500, 'mm') };
    const tilt = tiltFor(500, 2500);
    expect(cgHeightFigures(chassis, [tilt])).toMatchObject({ status: 'ok', value: { cgHeight: expect.closeTo(500, 6) } });
    expect(codes(engineeringChecks({ brakes: BRAKES, chassis }, { frontWeightPercent: 40 }))).toEqual([]);
    expect(codes(engineeringChecks({ brakes: BRAKES, chassis }, { frontWeightPercent: 40, weighIns: [tilt] }))).toEqual(['brake_split_outside_window']);
  });
});

describe('master cylinder against the caliper area (pedal travel; window common practice)', () => {
  it(`says nothing for ${MASTER_TRAVEL_WINDOW.min}–${MASTER_TRAVEL_WINDOW.max} mm of master travel per mm at the pistons`, () => {
    expect(codes(engineeringChecks({ brakes: BRAKES }, {}))).toEqual([]);
  });

  it('warns that a small bore runs out of stroke: a long, low pedal', () => {
    // 11,341 mm² of pistons on a 12 mm bore (113.1 mm²): 100.3 mm of travel, by hand.
    const w = only(engineeringChecks({ brakes: { ...BRAKES, hydraulics: { ...BRAKES.hydraulics, masterBoreMm: 12 } } }, {}), 'master_cylinder_too_small');
    expect(w.message).toBe('The master cylinder must travel 100.3 mm to move every caliper piston 1 mm.');
    expect(w.why).toMatch(/long, low pedal/);
    readsAsPlainWords(w);
  });

  it('warns that a large bore makes little pressure: a hard pedal', () => {
    // One 20 mm piston per wheel, four wheels (1,256.6 mm²), on a 50 mm bore (1,963.5 mm²): 0.6 mm, by hand.
    const small = { caliperKind: 'floating' as const, pistonDiametersMm: [20] };
    const brakes = { ...BRAKES, front: { ...BRAKES.front, ...small }, rear: { ...BRAKES.rear, ...small }, hydraulics: { ...BRAKES.hydraulics, masterBoreMm: 50 } };
    const w = only(engineeringChecks({ brakes }, {}), 'master_cylinder_too_large');
    expect(w.message).toBe('The master cylinder moves every caliper piston 1 mm in only 0.6 mm of travel.');
    expect(w.why).toMatch(/hard pedal/);
    readsAsPlainWords(w);
  });
});

describe('front geometry', () => {
  it('says nothing for the worked example (roll centre 102 mm up, camber gain negative)', () => {
    expect(codes(engineeringChecks({ chassis: GOOD_GEOMETRY }, {}))).toEqual([]);
  });

  it('warns of a roll centre below the ground', () => {
    // The lower arm rising outward puts the instant centre far outboard and high: the roll-centre line
    // from the contact patch crosses the centreline 197 mm below the ground.
    const w = only(engineeringChecks({ chassis: geometry([420, 440], [660, 470], [300, 120], [700, 200]) }, {}), 'roll_centre_below_ground');
    expect(w.message).toBe('The front roll centre works out 196.7 mm below the ground.');
    expect(w.why).toMatch(/body roll more/);
    readsAsPlainWords(w);
  });

  it('warns of a roll centre above the wheel centre', () => {
    // Arms converging steeply just inboard of the centreline, by hand: IC (40, 325), roll centre 343 mm up,
    // above a 330 mm wheel centre.
    const w = only(engineeringChecks({ chassis: geometry([420, 420], [660, 480], [300, 260], [700, 160]) }, {}), 'roll_centre_above_wheel_centre');
    expect(w.message).toBe('The front roll centre works out 343.1 mm high, above the wheel centre (330.0 mm).');
    expect(w.why).toMatch(/jacks the car up/);
    readsAsPlainWords(w);
  });

  it('warns of camber gain of the wrong sign: an upper arm longer than the lower', () => {
    // Parallel, level arms with the upper one longer: the upright tips its top outward in bump.
    const ws = engineeringChecks({ chassis: geometry([200, 450], [660, 450], [450, 180], [700, 180]) }, {});
    const w = only(ws, 'camber_gain_wrong_sign');
    expect(w.message).toMatch(/^In bump the front tyre’s top leans out: \+0\.\d\d° per 25 mm\.$/);
    expect(w.why).toMatch(/upper and lower points are not swapped/);
    readsAsPlainWords(w);
    expect(codes(ws)).not.toContain('roll_centre_below_ground');
  });
});

describe('quarter mile against power and weight (margin 15 %, common practice)', () => {
  // 300 hp and 1,500 kg (3,306.9 lb): Hale's rule gives 5.825 × (3306.9/300)^(1/3) = 12.96 s and
  // 234 × (300/3306.9)^(1/3) = 105.0 mph, by hand.
  const sections = (drivetrain: Sections['drivetrain']): Sections => ({ engine: { flywheelPower: est(300, 'hp') }, drivetrain });
  const weight = est(1500, 'kg');

  it('says nothing for a slip near the estimate', () => {
    expect(codes(engineeringChecks(sections({ quarterMileEt: 12.4, quarterMileTrap: est(110, 'mph') }), { weight }))).toEqual([]);
  });

  it('warns of an elapsed time far quicker than the estimate', () => {
    const w = only(engineeringChecks(sections({ quarterMileEt: 9.9 }), { weight }), 'quarter_mile_beyond_power');
    expect(w.message).toBe('A 9.90 s quarter mile is far quicker than the 12.96 s that the power and weight suggest.');
    expect(w.why).toMatch(/eighth mile/);
    readsAsPlainWords(w);
  });

  it('warns of a trap speed far above the estimate, in the unit it was typed', () => {
    const w = only(engineeringChecks(sections({ quarterMileTrap: est(210, 'km/h') }), { weight }), 'quarter_mile_trap_beyond_power');
    expect(w.message).toBe('A trap speed of 130 mph is far above the 105 mph that the power and weight suggest.');
    expect(w.field).toBe('drivetrain.quarterMileTrap');
    readsAsPlainWords(w);
  });
});

describe('pistons and the figures an owner shows', () => {
  it('reads staggered pistons as given and an older single size per counted piston', () => {
    expect(pistonDiameters({ caliperKind: 'opposed', pistonDiametersMm: [36, 40, 44] })).toEqual([36, 40, 44]);
    // Six pistons, opposed: three push each pad.
    expect(pistonDiameters({ caliperKind: 'opposed', caliperPistons: 6, pistonDiameterMm: 38 })).toEqual([38, 38, 38]);
    expect(pistonDiameters({ caliperKind: 'floating', caliperPistons: 2, pistonDiameterMm: 45 })).toEqual([45, 45]);
  });

  it('a computation that refuses its input names the box in the owner’s words, never NaN', () => {
    // The numbers panel works from unsaved boxes too, before the schema has refused them.
    const tall = brakeFigures({ ...BRAKES, front: { ...BRAKES.front, padHeightMm: 170 } });
    expect(tall).toEqual({ status: 'refused', field: 'front.padHeightMm', label: 'front pad radial height', reason: 'must be less than the rotor’s radius (half its diameter)' });
    const raised = cgHeightFigures({ wheelbase: est(1500, 'mm') }, [{ ...tiltFor(500, 2500), tilt: { ...tiltFor(500, 2500).tilt, raisedHeightMm: 1500 } }]);
    expect(raised).toMatchObject({ status: 'refused', label: 'height the axle was raised', reason: 'must be smaller than the wheelbase' });
  });

  it('shows nothing the owner did not choose, and the chosen figures in words with the caution', () => {
    const sections: Sections = { brakes: BRAKES, chassis: { ...GOOD_GEOMETRY, wheelbase: est(2500, 'mm') } };
    const weighIns = [tiltFor(500, 2500)];
    expect(shownEngineering({ sections, weighIns }, 'metric')).toBeNull();
    const chosen: Sections = { brakes: { ...BRAKES, showFigures: true }, chassis: { ...sections.chassis, showFigures: true } };
    const metric = shownEngineering({ sections: chosen, weighIns }, 'metric')!;
    expect(metric.figures.map((f) => [f.label, f.value])).toEqual([
      ['Brake split', '71\u00a0% front / 29\u00a0% rear est.'],
      ['Front roll-centre height', '102\u00a0mm est.'],
      ['Front camber gain', '−0.85° per 25\u00a0mm of bump est.'],
      ['Centre-of-gravity height', '500\u00a0mm est.'],
    ]);
    expect(metric.caution).toMatch(/^Estimates for presentation, not engineering approval/);
    expect(shownEngineering({ sections: chosen, weighIns }, 'imperial')!.figures[1]!.value).toBe('4.0\u00a0in est.');
  });
});

/** A weigh-in whose tilted reading gives CG height `h` over wheelbase `L` (mm): 1,000 kg, 500 kg an axle, front raised 300 mm, wheel centres 300 mm up. */
function tiltFor(h: number, L: number) {
  const raised = 300;
  const theta = Math.asin(raised / L);
  // h = r + L·ΔW/(W·tan θ) → ΔW = (h − r)·W·tan θ / L
  const dW = ((h - 300) * 1000 * Math.tan(theta)) / L;
  return { date: '2026-05-01', leftFront: 250, rightFront: 250, leftRear: 250, rightRear: 250, tilt: { raisedAxle: 'front' as const, raisedHeightMm: raised, wheelCentreHeightMm: 300, leftRaised: 250 + dW / 2, rightRaised: 250 + dW / 2 } };
}
