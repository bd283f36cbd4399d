// Road speed from engine speed through the gearbox, final drive and tyre:
// mph = rpm × D_in / (gear × axle × 1056/π), since one mile is 63 360 in and an hour 60 min,
// and 63 360 / 60 = 1056. Metric form: km/h = rpm × π × D_mm × 60 / (gear × axle × 10⁶).
// Tyre diameters are nominal (see NOMINAL_TYRE_NOTE); tyre growth at speed is ignored.
import { CalcInputError, finiteResult, requireNonNegative, requirePositive } from './errors';
import { UNITS } from './units';

/** 1056/π ≈ 336.135: the constant of the inch/mph form, kept exact rather than rounded. */
export const MPH_GEARING_CONSTANT = 1056 / Math.PI;

export interface Driveline {
  gearRatio: number;
  finalDrive: number;
}

export function roadSpeedMph(input: Driveline & { rpm: number; tyreDiameterIn: number }): number {
  const overall = overallRatio(input);
  requireNonNegative(input.rpm, 'rpm');
  requirePositive(input.tyreDiameterIn, 'tyreDiameterIn');
  return finiteResult((input.rpm * input.tyreDiameterIn) / (overall * MPH_GEARING_CONSTANT), 'mph');
}

export function roadSpeedKmh(input: Driveline & { rpm: number; tyreDiameterMm: number }): number {
  const overall = overallRatio(input);
  requireNonNegative(input.rpm, 'rpm');
  requirePositive(input.tyreDiameterMm, 'tyreDiameterMm');
  return finiteResult(
    (input.rpm * Math.PI * input.tyreDiameterMm * 60) / (overall * 1_000_000),
    'kmh',
  );
}

export function rpmAtMph(input: Driveline & { mph: number; tyreDiameterIn: number }): number {
  const overall = overallRatio(input);
  requireNonNegative(input.mph, 'mph');
  requirePositive(input.tyreDiameterIn, 'tyreDiameterIn');
  return finiteResult((input.mph * overall * MPH_GEARING_CONSTANT) / input.tyreDiameterIn, 'rpm');
}

export function rpmAtKmh(input: Driveline & { kmh: number; tyreDiameterMm: number }): number {
  const overall = overallRatio(input);
  requireNonNegative(input.kmh, 'kmh');
  requirePositive(input.tyreDiameterMm, 'tyreDiameterMm');
  return finiteResult(
    (input.kmh * overall * 1_000_000) / (Math.PI * input.tyreDiameterMm * 60),
    'rpm',
  );
}

export interface GearSpeed {
  /** 1-based gear number as the driver counts them. */
  gear: number;
  ratio: number;
  mph: number;
  kmh: number;
}

export interface GearTable {
  gears: number[];
  finalDrive: number;
  tyreDiameterIn: number;
}

/** Road speed in each gear at one engine speed. */
export function speedsInEachGear(input: GearTable & { rpm: number }): GearSpeed[] {
  const { gears, finalDrive, tyreDiameterIn, rpm } = input;
  if (!Array.isArray(gears) || gears.length === 0) {
    throw new CalcInputError('gears', 'needs at least one gear ratio');
  }
  return gears.map((ratio, index) => {
    requirePositive(ratio, `gears[${index}]`);
    const mph = roadSpeedMph({ rpm, gearRatio: ratio, finalDrive, tyreDiameterIn });
    return { gear: index + 1, ratio, mph, kmh: finiteResult(mph * UNITS.speed.mph, 'kmh') };
  });
}

export interface TopSpeeds {
  perGear: GearSpeed[];
  /** The fastest gear at the rev limit; ties go to the lower gear. */
  fastest: GearSpeed;
  note: string;
}

export const GEARING_TOP_SPEED_NOTE =
  'Speed the gearing allows at the rev limit; whether the engine can pull it against drag ' +
  'is another matter.';

/** Top speed in each gear at the rev limit, and the highest of them. */
export function topSpeedAtRevLimit(input: GearTable & { revLimitRpm: number }): TopSpeeds {
  const { gears, finalDrive, tyreDiameterIn, revLimitRpm } = input;
  requirePositive(revLimitRpm, 'revLimitRpm');
  const perGear = speedsInEachGear({ gears, finalDrive, tyreDiameterIn, rpm: revLimitRpm });
  const fastest = perGear.reduce((best, row) => (row.mph > best.mph ? row : best));
  return { perGear, fastest, note: GEARING_TOP_SPEED_NOTE };
}

function overallRatio({ gearRatio, finalDrive }: Driveline): number {
  requirePositive(gearRatio, 'gearRatio');
  requirePositive(finalDrive, 'finalDrive');
  return finiteResult(gearRatio * finalDrive, 'overallRatio');
}
