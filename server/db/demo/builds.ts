import type { BuildCreateInput, BuildUpdateInput, Credit, DynoRunCreateInput, WeighInCreateInput } from '@shared/schemas/build';
import type { Sections } from '@shared/schemas/build-sections';
import type { Drawing } from './art';

/** One invented build of the demo scenario. Parts are described generically; no real makers or shops. */
export type DemoBuild = BuildCreateInput & {
  ownerEmail: string;
  story: string;
  weight?: BuildUpdateInput['weight'];
  published: boolean;
  sections: Sections;
  credits: Credit[];
  drawings: { drawing: Drawing; caption: string }[];
  /** A drawn photo of the newest dyno run's printed sheet, kept with that run. */
  dynoSheet?: { caption: string };
  dynoRuns?: DynoRunCreateInput[];
  weighIns?: WeighInCreateInput[];
  private?: { vin?: string; plate?: string };
};

const est = <U extends string>(value: number, unit: U) => ({ value, unit, provenance: 'estimated' as const });
const meas = <U extends string>(value: number, unit: U, measuredOn: string) => ({ value, unit, provenance: 'measured' as const, measuredOn });
const target = <U extends string>(value: number, unit: U) => ({ value, unit, provenance: 'target' as const });

/** A smooth invented dyno curve: torque peaks mid-range, power where torque starts to fall. */
function curve(peakTorque: number, torquePeakRpm: number, limit: number, scale = 1) {
  const points = [];
  for (let rpm = 2500; rpm <= limit; rpm += 250) {
    const torque = peakTorque * (1 - ((rpm - torquePeakRpm) / (limit * 0.9)) ** 2) * scale;
    points.push({ rpm, torque: Math.round(torque * 10) / 10, power: Math.round(((torque * rpm) / 5252) * 10) / 10 });
  }
  return points;
}
// At the wheels, so below the 640 hp flywheel estimate (the spec check would flag anything else).
const fastbackCurve = curve(470, 4500, 6750);
const earlierCurve = curve(420, 4500, 6750);
const peakOf = (points: ReturnType<typeof curve>, key: 'power' | 'torque') => points.reduce((best, p) => (p[key] > best[key] ? p : best));

export const DEMO_OWNERS = [
  { email: 'marisol.tenney@placard.test', name: 'Marisol Tenney' },
  { email: 'ivo.brandt@placard.test', name: 'Ivo Brandt' },
  { email: 'june.okafor@placard.test', name: 'June Okafor' },
  { email: 'reuben.salas@placard.test', name: 'Reuben Salas' },
];

export const DEMO_BUILDS: DemoBuild[] = [
  {
    ownerEmail: 'owner@placard.test',
    title: '1967 Fastback',
    modelYear: 1967,
    bodyOrigin: 'Original steel fastback body, new quarter panels',
    style: 'pro-touring',
    published: true,
    story:
      'Bought as a rolling shell with a rusted floor and no drivetrain. The plan was a car that could do a track day on Saturday and a show on Sunday, so it got a modern aluminium-block V8 with a supercharger, a six-speed and a full coil-over suspension.\n\nFour years in the garage, most of it on the chassis. The paint is the last thing that went on, and the first thing people ask about.',
    weight: est(1530, 'kg'),
    private: { vin: 'DEMO-VIN-0001', plate: 'DEMO 01' },
    sections: {
      engine: {
        layout: 'V', cylinders: 8, bore: meas(94, 'mm', '2025-02-11'), stroke: meas(97.3, 'mm', '2025-02-11'), displacement: meas(5403, 'cm3', '2025-02-11'),
        blockMaterial: 'Aluminium', headMaterial: 'Aluminium, four valves per cylinder', aspiration: 'supercharged', superchargerType: 'Twin-screw, 2.3 L', pulley: '2.8 in upper pulley',
        boost: meas(0.9, 'bar', '2026-05-30'), fuel: '98 RON pump fuel', induction: 'Twin-screw supercharger with air-to-water intercooler', ignition: 'Coil-on-plug, standalone ECU',
        cooling: 'Aluminium radiator, twin electric fans', exhaust: 'Long-tube headers, 3 in twin system with X-pipe',
        flywheelPower: est(640, 'hp'), flywheelPowerRpm: 6500, flywheelTorque: est(760, 'Nm'), flywheelTorqueRpm: 4500, revLimit: 7000,
        madeBy: { kind: 'shop', name: 'An engine builder in the next county' }, note: 'A modern engine for a car that gets driven hard; the supercharger keeps the torque low in the rev range.',
      },
      drivetrain: {
        transmissionType: 'manual', transmission: 'Six-speed manual with a twin-disc clutch', gears: [2.66, 1.78, 1.3, 1.0, 0.8, 0.63], clutch: 'Twin-disc, 10.5 in',
        driveshaft: '3.5 in aluminium, one piece', axle: '9 in style rear with a nodular case', finalDrive: 3.55, axleSplines: 31, limitedSlip: 'clutch-type', topSpeed: est(290, 'km/h'),
        madeBy: { kind: 'owner' }, note: 'The tall sixth gear makes motorway trips quiet.',
      },
      chassis: {
        frame: 'modified', frameDescription: 'Factory unibody with welded-in subframe connectors and a six-point bolt-in bar',
        tubes: [{ use: 'Subframe connectors', shape: 'rectangular', material: 'Mild steel', outside: est(76.2, 'mm'), height: est(50.8, 'mm'), wall: est(3.05, 'mm') }],
        wheelbase: meas(2743, 'mm', '2025-08-20'), trackFront: est(1530, 'mm'), trackRear: est(1520, 'mm'),
        front: {
          type: 'double-wishbone', springType: 'coil-over', springRate: est(650, 'lb/in'), motionRatio: 0.72, cornerSprungMass: est(370, 'kg'), dampers: 'Double-adjustable monotube', antiRollBar: '1.25 in hollow, adjustable',
          // Measured off the car at ride height (invented): roll centre about 106 mm up, −0.83° per 25 mm of bump.
          geometry: { upperInner: { x: 430, y: 450 }, upperOuter: { x: 680, y: 480 }, lowerInner: { x: 310, y: 190 }, lowerOuter: { x: 710, y: 170 }, contactPatchXMm: 765, wheelCentreHeightMm: 318 },
        },
        rear: {
          type: 'four-link', springType: 'coil-over', springRate: est(225, 'lb/in'), motionRatio: 0.9, cornerSprungMass: est(330, 'kg'), dampers: 'Single-adjustable monotube', antiRollBar: 'Splined 1 in bar',
          fourLink: { upperFront: { x: 560, y: 400 }, upperRear: { x: 0, y: 440 }, lowerFront: { x: 620, y: 250 }, lowerRear: { x: 0, y: 230 }, cgHeightMm: 480 },
        },
        madeBy: { kind: 'owner' }, note: 'Most of the four years went here.',
        showFigures: true,
      },
      brakes: {
        front: { type: 'disc', rotorDiameter: meas(355, 'mm', '2025-09-01'), rotorThickness: est(32, 'mm'), caliperPistons: 6, caliper: 'Six-piston forged monoblock', pad: 'Street/track compound', caliperKind: 'opposed', pistonDiametersMm: [30, 34, 38], padHeightMm: 52, padMu: 0.45 },
        rear: { type: 'disc', rotorDiameter: est(330, 'mm'), rotorThickness: est(25, 'mm'), caliperPistons: 4, caliper: 'Four-piston with a drum-in-hat parking brake', caliperKind: 'opposed', pistonDiametersMm: [30, 34], padHeightMm: 44, padMu: 0.4 },
        masterCylinder: '1 in bore, aluminium', booster: 'Vacuum, 8 in dual diaphragm', parkingBrake: 'Drum-in-hat, cable',
        // About 67 % of the torque in front, against 52 % of the weight (invented figures).
        hydraulics: { pedalRatio: 4.5, pedalForce: est(300, 'N'), boosterAssist: 3, masterBoreMm: 25.4 },
        showFigures: true,
        madeBy: { kind: 'new' },
      },
      wheels: {
        front: { rimDiameterIn: 18, rimWidthIn: 10, offset: est(38, 'mm'), construction: 'Forged one-piece', tyreSize: '275/35ZR18 95Y', pressure: est(2.3, 'bar') },
        rear: { rimDiameterIn: 18, rimWidthIn: 12, offset: est(45, 'mm'), construction: 'Forged one-piece', tyreSize: '315/30ZR18 98Y', pressure: est(2.2, 'bar') },
        madeBy: { kind: 'new' },
      },
      body: {
        paint: 'Deep graphite metallic with satin black stripes', bodyMods: 'Shaved drip rails, flush glass, tucked bumpers', glass: 'Tinted laminated',
        seats: 'Fixed-back buckets in grey leather', gauges: 'Digital dash in the original bezel', safety: 'Six-point bar, four-point harnesses, handheld extinguisher',
        madeBy: { kind: 'shop', name: 'A small body shop run by two brothers' },
      },
      extra: { lines: [{ label: 'Audio', value: 'None. The supercharger is the music.' }, { label: 'Fuel tank', value: '70 L baffled tank with an in-tank pump' }] },
    },
    credits: [
      { role: 'engine build', name: 'An engine builder in the next county' },
      { role: 'paint', name: 'A small body shop run by two brothers' },
      { role: 'chassis', name: 'The owner' },
      { role: 'upholstery', name: 'A trim shop across town' },
    ],
    drawings: [
      { drawing: { body: '#3A3D42', sky: '#D8D0C0', ground: '#55524C', roof: 'low', stance: 18 }, caption: 'Side view at the spring meet' },
      { drawing: { body: '#3A3D42', sky: '#F5F0E6', ground: '#8A8478', roof: 'low', stance: 18 }, caption: 'In the shop before the stripes' },
    ],
    dynoSheet: { caption: 'The printed sheet from the dyno day' },
    dynoRuns: [
      {
        date: '2026-05-30', facility: 'A rolling-road shop by the airfield', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft',
        peakPower: peakOf(fastbackCurve, 'power').power, peakPowerRpm: peakOf(fastbackCurve, 'power').rpm, peakTorque: peakOf(fastbackCurve, 'torque').torque, peakTorqueRpm: peakOf(fastbackCurve, 'torque').rpm,
        curve: fastbackCurve, note: 'Third pull of the day, 28 °C ambient.',
      },
      {
        date: '2025-10-04', facility: 'A rolling-road shop by the airfield', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft',
        peakPower: peakOf(earlierCurve, 'power').power, peakPowerRpm: peakOf(earlierCurve, 'power').rpm, peakTorque: peakOf(earlierCurve, 'torque').torque, peakTorqueRpm: peakOf(earlierCurve, 'torque').rpm,
        curve: earlierCurve, note: 'Before the smaller pulley.',
      },
    ],
    // The front raised 350 mm on blocks, the rear scales read again: a centre of gravity about 483 mm up.
    weighIns: [{ date: '2026-06-01', unit: 'kg', leftFront: 412, rightFront: 398, leftRear: 366, rightRear: 371, withDriver: false, fuelLevel: 'half', note: 'Club scales, no driver.', tilt: { raisedAxle: 'front', raisedHeightMm: 350, wheelCentreHeightMm: 318, leftRaised: 372, rightRaised: 377 } }],
  },
  {
    ownerEmail: 'owner@placard.test',
    title: '1932 Highboy Roadster',
    modelYear: 1932,
    bodyOrigin: 'Steel reproduction roadster body',
    style: 'hot-rod',
    published: true,
    story: 'A traditional highboy: no fenders, a dropped axle up front and a small-block with three two-barrel carburettors. Built in the spirit of the cars that ran on the dry lakes.',
    weight: est(1020, 'kg'),
    sections: {
      engine: { layout: 'V', cylinders: 8, bore: meas(4.03, 'in', '2024-03-02'), stroke: meas(3.48, 'in', '2024-03-02'), aspiration: 'natural', induction: 'Three two-barrel carburettors on a tall intake', ignition: 'Distributor with an electronic module', exhaust: 'Lake-style headers', flywheelPower: est(330, 'hp'), revLimit: 6200, madeBy: { kind: 'owner' } },
      drivetrain: { transmissionType: 'manual', transmission: 'Four-speed manual', gears: [2.64, 1.75, 1.33, 1.0], finalDrive: 3.78, axle: 'Quick-change rear', limitedSlip: 'open', madeBy: { kind: 'donor', name: 'A 1960s sedan from a scrapyard' } },
      chassis: { frame: 'custom', frameDescription: 'Reproduction rails, boxed, with a tubular K-member', front: { type: 'beam-axle', springType: 'transverse-leaf', description: '4 in dropped I-beam axle, hairpin radius rods' }, rear: { type: 'ladder-bar', springType: 'coil-over' } },
      brakes: { front: { type: 'disc', rotorDiameter: est(11, 'in'), caliperPistons: 2 }, rear: { type: 'drum', rotorDiameter: est(11, 'in') }, masterCylinder: 'Dual circuit, under the floor' },
      wheels: { front: { rimDiameterIn: 16, rimWidthIn: 4.5, tyreSize: '165/80R16' }, rear: { rimDiameterIn: 16, rimWidthIn: 8, tyreSize: '33x12.50R15' }, raked: true },
      body: { paint: 'Black lacquer', bodyMods: 'Chopped windscreen posts, filled cowl vent', seats: 'Bench in red tuck-and-roll' },
    },
    credits: [{ role: 'upholstery', name: 'A trim shop across town' }],
    drawings: [{ drawing: { body: '#1C1B19', sky: '#EBD9B4', ground: '#C9B48A', roof: 'none', stance: 0 }, caption: 'On the salt-coloured gravel' }],
  },
  {
    ownerEmail: 'owner@placard.test',
    title: '1985 Turbo Hatch',
    modelYear: 1985,
    bodyOrigin: 'Factory steel hatchback',
    style: 'restomod',
    published: false,
    story: 'A work in progress: the engine is in, the numbers are targets until the dyno day.',
    sections: {
      engine: { layout: 'inline', cylinders: 4, bore: est(86, 'mm'), stroke: est(86, 'mm'), aspiration: 'turbocharged', turboCount: 1, boost: target(1.4, 'bar'), flywheelPower: target(300, 'PS'), revLimit: 7500 },
      wheels: { front: { rimDiameterIn: 15, rimWidthIn: 7, offset: est(25, 'mm'), tyreSize: '195/50R15' }, rear: { rimDiameterIn: 15, rimWidthIn: 7, offset: est(25, 'mm'), tyreSize: '195/50R15' } },
    },
    credits: [],
    drawings: [],
  },
  {
    ownerEmail: 'marisol.tenney@placard.test', title: '1936 Three-Window Coupe', modelYear: 1936, bodyOrigin: 'Three-window coupe body, steel', style: 'custom', published: true,
    story: 'Chopped three inches and channelled over the frame. The roof took a whole winter.', weight: est(1180, 'kg'),
    sections: {
      engine: { layout: 'V', cylinders: 8, displacement: est(5.7, 'L'), aspiration: 'natural', induction: 'Four-barrel carburettor', flywheelPower: est(350, 'hp') },
      drivetrain: { transmissionType: 'automatic', transmission: 'Four-speed automatic with overdrive', gears: [2.48, 1.48, 1.0, 0.75], finalDrive: 3.08 },
      body: { paint: 'Candy apple red over silver base', bodyMods: 'Chopped 3 in, channelled 4 in, shaved door handles' },
      wheels: { front: { rimDiameterIn: 15, rimWidthIn: 5, tyreSize: 'P205/75R15' }, rear: { rimDiameterIn: 15, rimWidthIn: 7, tyreSize: 'P235/75R15' } },
    },
    credits: [{ role: 'body', name: 'The owner and a retired panel beater' }],
    drawings: [{ drawing: { body: '#A8261B', sky: '#F5F0E6', ground: '#55524C', roof: 'low', stance: 30 }, caption: 'Low and red' }],
  },
  {
    ownerEmail: 'marisol.tenney@placard.test', title: '1949 Fastback Sedan', modelYear: 1949, bodyOrigin: 'Two-door fastback sedan, steel', style: 'custom', published: true,
    story: 'Lowered on air bags, frenched headlights, a long slow sled.',
    sections: { chassis: { front: { type: 'double-wishbone', springType: 'air' }, rear: { type: 'leaf', springType: 'air' } }, body: { paint: 'Seafoam green', bodyMods: 'Frenched headlights, nosed and decked' } },
    credits: [], drawings: [{ drawing: { body: '#6FA38E', sky: '#EFE7D6', ground: '#7A746A', roof: 'tall', stance: 40 }, caption: 'Aired out' }],
  },
  {
    ownerEmail: 'ivo.brandt@placard.test', title: '1955 Gasser', modelYear: 1955, bodyOrigin: 'Two-door post sedan, steel with a glass-fibre front end', style: 'gasser', published: true,
    story: 'Straight axle, nose up, tall tyres at the back. Built to look like the drag strip of its day.',
    sections: {
      engine: { layout: 'V', cylinders: 8, displacement: est(427, 'in3'), aspiration: 'supercharged', superchargerType: 'Roots-type 6-71 blower', fuel: 'Race fuel', flywheelPower: est(650, 'hp') },
      drivetrain: { transmissionType: 'manual', transmission: 'Four-speed manual', gears: [2.2, 1.64, 1.28, 1.0], finalDrive: 4.56, limitedSlip: 'spool' },
      wheels: { front: { rimDiameterIn: 15, rimWidthIn: 4, tyreSize: '165/80R15' }, rear: { rimDiameterIn: 15, rimWidthIn: 10, tyreSize: '31x13.50R15' }, raked: true },
    },
    credits: [], drawings: [{ drawing: { body: '#D9481C', sky: '#F5F0E6', ground: '#55524C', roof: 'tall', stance: -30 }, caption: 'Nose up' }],
  },
  {
    ownerEmail: 'ivo.brandt@placard.test', title: '1957 Wagon', modelYear: 1957, bodyOrigin: 'Two-door wagon, steel', style: 'restomod', published: true,
    story: 'The family hauler turned into a comfortable cruiser with air conditioning and disc brakes all round.', weight: meas(1690, 'kg', '2025-07-12'),
    sections: {
      engine: { layout: 'V', cylinders: 8, displacement: est(6.2, 'L'), aspiration: 'natural', flywheelPower: est(430, 'hp') },
      chassis: {
        frame: 'factory', wheelbase: est(2921, 'mm'), trackFront: est(1490, 'mm'),
        front: { type: 'double-wishbone', springType: 'coil', geometry: { upperInner: { x: 400, y: 470 }, upperOuter: { x: 640, y: 490 }, lowerInner: { x: 280, y: 200 }, lowerOuter: { x: 690, y: 175 }, contactPatchXMm: 745, wheelCentreHeightMm: 335 } },
        showFigures: true,
      },
      brakes: {
        front: { type: 'disc', rotorDiameter: est(13, 'in'), caliperPistons: 4, caliperKind: 'opposed', pistonDiametersMm: [42, 42], padHeightMm: 50, padMu: 0.4 },
        rear: { type: 'disc', rotorDiameter: est(12, 'in'), caliperPistons: 2, caliperKind: 'floating', pistonDiametersMm: [38, 38], padHeightMm: 42, padMu: 0.38 },
        masterCylinder: '1 1/8 in bore, cast iron', booster: 'Vacuum, 9 in single diaphragm',
        // A proportioning valve trims the rear: about 64 % of the torque in front (invented figures).
        hydraulics: { pedalRatio: 4, pedalForce: est(300, 'N'), boosterAssist: 3.5, masterBoreMm: 28.6, valveKnee: est(40, 'bar'), valveSlope: 0.43 },
        showFigures: true,
      },
    },
    weighIns: [{ date: '2025-07-12', unit: 'kg', leftFront: 468, rightFront: 462, leftRear: 382, rightRear: 378, withDriver: false, fuelLevel: 'full', note: 'Weighed level, then with the front on 300 mm blocks.', tilt: { raisedAxle: 'front', raisedHeightMm: 300, wheelCentreHeightMm: 335, leftRaised: 388, rightRaised: 385.5 } }],
    credits: [], drawings: [{ drawing: { body: '#2E7D4F', sky: '#EFE7D6', ground: '#8A8478', roof: 'wagon', stance: 12 }, caption: 'Ready for the road trip' }],
  },
  {
    ownerEmail: 'june.okafor@placard.test', title: '1963 Split-Window Coupe', modelYear: 1963, bodyOrigin: 'Glass-fibre coupe body', style: 'restomod', published: true,
    story: 'A modern chassis under a classic glass-fibre body.',
    sections: { chassis: { frame: 'custom', frameDescription: 'Aftermarket perimeter frame, independent rear', wheelbase: est(2490, 'mm'), rear: { type: 'independent-rear', springType: 'coil-over' } } },
    credits: [], drawings: [{ drawing: { body: '#B7791F', sky: '#F5F0E6', ground: '#55524C', roof: 'low', stance: 16 }, caption: '' }],
  },
  {
    ownerEmail: 'june.okafor@placard.test', title: '1969 Muscle Coupe', modelYear: 1969, bodyOrigin: 'Two-door hardtop, steel', style: 'muscle', published: true,
    story: 'Numbers-matching big-block, rebuilt to factory specification.',
    sections: { engine: { layout: 'V', cylinders: 8, displacement: est(7.0, 'L'), aspiration: 'natural', flywheelPower: est(425, 'hp') }, drivetrain: { transmissionType: 'manual', gears: [2.2, 1.64, 1.28, 1.0], finalDrive: 3.73 } },
    credits: [], drawings: [],
  },
  {
    ownerEmail: 'reuben.salas@placard.test', title: '1972 Short-Bed Pickup', modelYear: 1972, bodyOrigin: 'Short-bed pickup cab and bed, steel', style: 'truck', published: true,
    story: 'Bagged, bodied and still hauls lumber.',
    sections: { engine: { layout: 'inline', cylinders: 6, displacement: est(4.8, 'L'), aspiration: 'turbocharged', turboCount: 1 } },
    credits: [], drawings: [{ drawing: { body: '#55524C', sky: '#EBD9B4', ground: '#7A746A', roof: 'tall', stance: 24 }, caption: 'Work truck' }],
  },
  {
    ownerEmail: 'reuben.salas@placard.test', title: '1978 Lowrider Sedan', modelYear: 1978, bodyOrigin: 'Four-door sedan, steel', style: 'lowrider', published: true,
    story: 'Hydraulics on every corner, murals on the trunk lid.',
    sections: { chassis: { front: { type: 'double-wishbone', springType: 'coil', description: 'Hydraulic cylinders' }, rear: { type: 'four-link', springType: 'coil', description: 'Hydraulic cylinders' } }, body: { paint: 'Flake purple with murals' } },
    credits: [{ role: 'paint', name: 'A mural artist from the neighbourhood' }], drawings: [{ drawing: { body: '#5B3F8C', sky: '#F5F0E6', ground: '#55524C', roof: 'tall', stance: 50 }, caption: 'Three-wheel motion' }],
  },
  {
    ownerEmail: 'judge@placard.test', title: '1930 Rat Rod Coupe', modelYear: 1930, bodyOrigin: 'Five-window coupe body, patina steel', style: 'rat-rod', published: true,
    story: 'Patina kept, rust sealed, everything else new underneath.',
    sections: { engine: { layout: 'inline', cylinders: 6, displacement: est(250, 'in3'), aspiration: 'natural' } },
    credits: [], drawings: [{ drawing: { body: '#8A5A3C', sky: '#EBD9B4', ground: '#7A746A', roof: 'tall', stance: 36 }, caption: 'Honest patina' }],
  },
];
