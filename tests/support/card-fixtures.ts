// Invented builds as the public presenter hands them out, for template and page tests that need no
// database. Names, shops and parts are made up; parts are described generically.
import type { PublicBuild } from '@shared/schemas/build';
import type { Sections } from '@shared/schemas/build-sections';

const m = <U extends string>(value: number, unit: U) => ({ value, unit, provenance: 'measured' as const });
const est = <U extends string>(value: number, unit: U) => ({ value, unit, provenance: 'estimated' as const });
const target = <U extends string>(value: number, unit: U) => ({ value, unit, provenance: 'target' as const });

export const TYPICAL_SECTIONS: Sections = {
  engine: {
    layout: 'V',
    cylinders: 8,
    bore: m(92.2, 'mm'),
    stroke: m(101.6, 'mm'),
    displacement: m(5.4, 'L'),
    blockMaterial: 'aluminium',
    headMaterial: 'aluminium, four valves per cylinder',
    aspiration: 'supercharged',
    superchargerType: 'twin-screw',
    boost: est(0.9, 'bar'),
    fuel: 'E85',
    induction: 'port injection, 80 lb/h injectors',
    ignition: 'coil-on-plug, standalone engine computer',
    cooling: 'aluminium crossflow radiator, twin fans',
    exhaust: 'long-tube headers, 3 in stainless X-pipe',
    flywheelPower: est(650, 'hp'),
    flywheelPowerRpm: 6400,
    flywheelTorque: est(610, 'lbft'),
    flywheelTorqueRpm: 4200,
    revLimit: 7000,
    madeBy: { kind: 'shop', name: 'Tallow Creek Engine Works' },
    note: 'The block came from a wrecked donor and was line-bored before the rotating assembly went in.',
  },
  drivetrain: {
    transmissionType: 'manual',
    transmission: 'six-speed with a twin-disc clutch',
    gears: [2.97, 2.07, 1.43, 1.0, 0.84, 0.56],
    driveshaft: 'carbon one-piece',
    axle: '9 in style housing, 31-spline axles',
    finalDrive: 3.73,
    limitedSlip: 'clutch-type',
    madeBy: { kind: 'owner' },
  },
  chassis: {
    frame: 'custom',
    frameDescription: '2 × 4 in rectangular rails, boxed and notched',
    wheelbase: m(2743, 'mm'),
    trackFront: m(1560, 'mm'),
    trackRear: m(1540, 'mm'),
    front: { type: 'double-wishbone', springType: 'coil-over', springRate: m(550, 'lb/in'), dampers: 'double-adjustable monotube' },
    rear: { type: 'four-link', springType: 'coil-over', springRate: m(225, 'lb/in'), antiRollBar: 'splined 1 in bar' },
    madeBy: { kind: 'shop', name: 'Low Bridge Chassis' },
  },
  brakes: {
    front: { type: 'disc', rotorDiameter: m(355, 'mm'), rotorThickness: m(32, 'mm'), caliperPistons: 6 },
    rear: { type: 'disc', rotorDiameter: m(330, 'mm'), caliperPistons: 4 },
    masterCylinder: '1 in bore, manual',
  },
  wheels: {
    front: { rimDiameterIn: 18, rimWidthIn: 9, tyreSize: '275/35R18', construction: 'forged three-piece', pressure: m(2.2, 'bar') },
    rear: { rimDiameterIn: 19, rimWidthIn: 11, tyreSize: '335/30R19', construction: 'forged three-piece', pressure: m(2.1, 'bar') },
  },
  body: {
    paint: 'deep oxblood over graphite, satin clear',
    bodyMods: 'shaved drip rails, flush glass, hand-formed rear spoiler',
    seats: 'low-back buckets in tan leather',
    gauges: 'digital dash in the original binnacle',
    madeBy: { kind: 'shop', name: 'Kestrel Lane Paint' },
  },
  extra: { lines: [{ label: 'Fuel cell', value: '16 gal, foam-filled' }] },
};

export function typicalPublicBuild(overrides: Partial<PublicBuild> = {}): PublicBuild {
  return {
    code: 'K7P2M9Q',
    url: 'http://127.0.0.1:3999/c/K7P2M9Q',
    title: 'Night Shift',
    modelYear: 1969,
    bodyOrigin: 'fastback coupe',
    style: 'restomod',
    story: 'Bought as a rolling shell with no engine. Four winters in a one-car garage later, it drives to every show it enters.\n\nThe brief was simple: looks stock from across the field, surprises up close.',
    ownerName: 'Rowan Teller',
    weight: est(1540, 'kg'),
    sections: TYPICAL_SECTIONS,
    credits: [
      { role: 'paint', name: 'Kestrel Lane Paint' },
      { role: 'chassis', name: 'Low Bridge Chassis' },
      { role: 'upholstery', name: 'M. Okafor' },
    ],
    photos: [],
    dynoRuns: [
      {
        date: '2026-04-18',
        facility: 'a rolling-road day',
        standard: 'SAE J1349',
        measuredAt: 'wheel',
        powerUnit: 'hp',
        torqueUnit: 'lbft',
        peakPower: 548,
        peakPowerRpm: 6300,
        peakTorque: 512,
        peakTorqueRpm: 4300,
        curve: Array.from({ length: 14 }, (_, i) => {
          const rpm = 2200 + i * 350;
          const torque = 420 + 92 * Math.sin((Math.PI * (rpm - 1800)) / 5600);
          return { rpm, torque: Math.round(torque), power: Math.round((torque * rpm) / 5252) };
        }),
      },
      {
        date: '2025-10-02',
        standard: 'SAE J1349',
        measuredAt: 'wheel',
        powerUnit: 'hp',
        torqueUnit: 'lbft',
        peakPower: 502,
        peakPowerRpm: 6100,
        peakTorque: 480,
        peakTorqueRpm: 4100,
        curve: Array.from({ length: 13 }, (_, i) => {
          const rpm = 2200 + i * 350;
          const torque = 395 + 85 * Math.sin((Math.PI * (rpm - 1800)) / 5400);
          return { rpm, torque: Math.round(torque), power: Math.round((torque * rpm) / 5252) };
        }),
      },
    ],
    weighIns: [],
    updatedAt: '2026-05-01T12:00:00.000Z',
    ...overrides,
  };
}

const long = (label: string, n: number) => `${label} `.repeat(Math.ceil(n / (label.length + 1))).slice(0, n).trim();

/** Every field at or near its longest allowed length: the card must still be one page. */
export function longestPublicBuild(): PublicBuild {
  const end = { type: 'triangulated-four-link' as const, springType: 'transverse-leaf' as const, springRate: target(999, 'N/mm'), motionRatio: 0.7, dampers: long('adjustable', 200), antiRollBar: long('splined', 200), description: long('fabricated', 300) };
  const brake = { type: 'disc' as const, rotorDiameter: m(480, 'mm'), rotorThickness: m(40, 'mm'), caliperPistons: 12, caliper: long('caliper', 200), pad: long('compound', 120) };
  const wheel = { rimDiameterIn: 26, rimWidthIn: 15.5, offset: m(-76, 'mm'), construction: long('billet', 120), tyreSize: '35x12.50R20', tyre: long('radial', 120), pressure: target(2.4, 'bar') };
  const sections: Sections = {
    engine: { ...TYPICAL_SECTIONS.engine, induction: long('intake', 200), ignition: long('spark', 200), cooling: long('coolant', 200), exhaust: long('header', 200), superchargerType: long('screw', 120), pulley: long('pulley', 80), fuel: long('ethanol', 80), note: long('reason', 2000) },
    drivetrain: { ...TYPICAL_SECTIONS.drivetrain, transmissionType: 'dog-engagement', transmission: long('gearbox', 200), gears: [3.2, 2.4, 1.9, 1.55, 1.3, 1.12, 1.0, 0.88, 0.76, 0.64], clutch: long('clutch', 200), driveshaft: long('shaft', 200), axle: long('axle', 200) },
    chassis: { ...TYPICAL_SECTIONS.chassis, frameDescription: long('rails', 300), front: end, rear: end, tubes: Array.from({ length: 12 }, (_, i) => ({ use: `${long('cage', 70)} ${i}`, shape: 'rectangular' as const, material: long('chromoly', 80), outside: m(50.8, 'mm'), height: m(76.2, 'mm'), wall: m(3.05, 'mm') })) },
    brakes: { front: brake, rear: brake, masterCylinder: long('master', 200), booster: long('booster', 200), parkingBrake: long('parking', 200), madeBy: { kind: 'shop', name: long('Brake Shop', 120) } },
    wheels: { front: wheel, rear: wheel, madeBy: { kind: 'new', name: long('catalogue', 120) } },
    body: { paint: long('candy', 300), bodyMods: long('chopped', 600), glass: long('tinted', 200), seats: long('buckets', 200), gauges: long('gauges', 200), safety: long('harness', 400), madeBy: { kind: 'donor', name: long('donor', 120) } },
    extra: { lines: Array.from({ length: 30 }, (_, i) => ({ label: `${long('Extra', 55)} ${i}`, value: long('value', 300) })) },
  };
  return typicalPublicBuild({
    title: long('Longest Title', 120),
    modelYear: 2027,
    bodyOrigin: long('Hand-formed aluminium body', 200),
    style: 'pro-touring',
    ownerName: long('Owner Name', 80),
    weight: target(2999, 'kg'),
    story: long('story', 10_000),
    sections,
    credits: Array.from({ length: 40 }, (_, i) => ({ role: long('upholstery', 60), name: `${long('Person', 110)} ${i}` })),
  });
}

/** A build with a title and little else: the card must still fill its page. */
export function sparsePublicBuild(overrides: Partial<PublicBuild> = {}): PublicBuild {
  return typicalPublicBuild({
    title: 'Barn Find',
    modelYear: 1951,
    bodyOrigin: 'two-door sedan',
    style: null,
    story: 'Found under a tarp; running again after one summer.',
    weight: null,
    sections: { engine: { layout: 'inline', cylinders: 6, flywheelPower: est(95, 'hp') } },
    credits: [],
    dynoRuns: [],
    weighIns: [],
    ...overrides,
  });
}

const exactly = (n: number, text: string) => text.padEnd(n, ' x').slice(0, n).trim().padEnd(n, 'x');

/** The entry blocks the card tests print: numbers 7, 47, 1047 and 9999 with 60-character show names and classes. */
export const ENTRY_SHOWS = [
  { showName: exactly(60, 'Riverside Autumn Run and Swap Meet, Sunday Show Field, Row C'), className: exactly(60, 'Restomods 1960 to 1975, steel bodies, modern running gear'), entryNumber: '7' },
  { showName: exactly(60, 'Harbour Lights Charity Show and Shine, Saturday Evening Session'), className: exactly(60, 'Pre-1949 closed cars with full fenders and any engine at all'), entryNumber: '47' },
  { showName: exactly(60, 'Long Valley Gathering of Hot Rods, Customs and Trucks, Day 2'), className: exactly(60, 'Street machines 1970 to 1989 with modified engines and paint'), entryNumber: '1047' },
  { showName: exactly(60, 'Northern Plains Regional Championship for Pro-Touring Builds'), className: exactly(60, 'Best engineered chassis, tube frame or unibody, judged on lift'), entryNumber: '9999' },
];
/** The longest show name and class the schema allows. */
export const LONGEST_SHOW = { showName: exactly(80, 'Grand Autumn Gathering of Hot Rods, Customs, Trucks and Restomods, Main Field East'), className: exactly(60, 'Modified street cars and trucks with engines of any layout'), entryNumber: '9999' };

/** A build with nothing but its title. */
export const emptyPublicBuild = (): PublicBuild =>
  typicalPublicBuild({ title: 'Untitled project', modelYear: null, bodyOrigin: null, style: null, story: '', weight: null, sections: {}, credits: [], dynoRuns: [], weighIns: [] });

/** The longest title allowed (120 characters) on an otherwise typical build. */
export const longTitlePublicBuild = (): PublicBuild => typicalPublicBuild({ title: exactly(120, 'The Midnight Oxblood Fastback That Took Four Winters, Two Engines and One Very Patient Neighbour to Finish') });
