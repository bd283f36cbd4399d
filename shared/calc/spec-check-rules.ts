// Spec check: warnings when a build sheet's figures disagree with each other or with physics.
// It never throws on what an owner types; unreadable figures become warnings of their own.
import { displacement } from './engine';
import { DEFAULT_DECIMALS, formatNumber, formatQuantity } from './format';
import { enteredDecimals } from './precision';
import { topSpeedAtRevLimit } from './gearing';
import { powerToWeight } from './power';
import {
  SPEC_CHECK_DEFAULTS,
  type SpecCheckInput,
  type SpecCheckOptions,
  type SpecWarning,
} from './spec-check-contract';
import { SpecWarningCollector, isFigure, isIsoDate, showFigure } from './spec-warning-collector';
import type { TyreDimensions } from './tyres';
import { UNITS, convert, parseUnit } from './units';
import { wheelSpacing } from './wheels';

export * from './spec-check-contract';

export function specCheck(input: SpecCheckInput, options: SpecCheckOptions = {}): SpecWarning[] {
  const ctx = new SpecWarningCollector({ ...SPEC_CHECK_DEFAULTS, ...options });
  ctx.run('engine.displacement', () => checkDisplacement(ctx, input));
  ctx.run('engine.wheelPower', () => checkWheelPower(ctx, input));
  ctx.run('performance.topSpeed', () => checkTopSpeed(ctx, input));
  ctx.run('wheels.rear.tyre', () => checkTyreDiameters(ctx, input));
  ctx.run('wheels.front.offset', () => checkFrontspacing(ctx, input, 'front'));
  ctx.run('wheels.rear.offset', () => checkFrontspacing(ctx, input, 'rear'));
  ctx.run('chassis.weight', () => checkPowerToWeight(ctx, input));
  checkMeasuredDates(ctx, input, '');
  return ctx.warnings;
}

function checkDisplacement(ctx: SpecWarningCollector, { engine }: SpecCheckInput): void {
  if (!engine?.bore || !engine.stroke || !engine.displacement) return;
  if (engine.cylinders === undefined) return;
  const bore = ctx.read('length', engine.bore, 'mm', 'engine.bore');
  const stroke = ctx.read('length', engine.stroke, 'mm', 'engine.stroke');
  const stated = ctx.read('volume', engine.displacement, 'cm3', 'engine.displacement');
  const cylinders = engine.cylinders;
  if (!Number.isInteger(cylinders) || cylinders <= 0) {
    ctx.unreadable('engine.cylinders', 'the cylinder count must be a whole number above zero');
    return;
  }
  if (bore === undefined || stroke === undefined || stated === undefined) return;
  const computed = displacement({ bore, stroke, unit: 'mm', cylinders }).cm3;
  if (Math.abs(stated - computed) / computed <= ctx.options.displacementTolerance) return;
  const unit = parseUnit('volume', engine.displacement.unit) ?? 'cm3';
  const show = (cm3: number) =>
    formatQuantity(
      { value: convert('volume', cm3, 'cm3', unit), unit },
      { decimals: DEFAULT_DECIMALS[unit] + 1 },
    );
  const tolerance = formatNumber(ctx.options.displacementTolerance * 100, { decimals: 1 });
  ctx.warn(
    'displacement_mismatch',
    'engine.displacement',
    `Bore × stroke × ${cylinders} cylinders gives ${show(computed)}, ` +
      // The owner's own figure as they typed it: no decimals added to it.
      `but the sheet says ${formatQuantity({ value: engine.displacement.value, unit }, { decimals: enteredDecimals(engine.displacement.value) })}.`,
    `Displacement follows from bore, stroke and cylinder count. A gap of more than ${tolerance}% ` +
      'usually means a typo or a unit mix-up; badge figures are often rounded, so give the ' +
      'exact one or correct the bore and stroke.',
  );
}

function checkWheelPower(ctx: SpecWarningCollector, { engine }: SpecCheckInput): void {
  if (!engine?.flywheelPower || !engine.wheelPower) return;
  const flywheel = ctx.read('power', engine.flywheelPower, 'W', 'engine.flywheelPower');
  const wheel = ctx.read('power', engine.wheelPower, 'W', 'engine.wheelPower');
  if (flywheel === undefined || wheel === undefined || wheel <= flywheel) return;
  ctx.warn(
    'wheel_power_above_flywheel',
    'engine.wheelPower',
    `Wheel power (${showFigure('power', engine.wheelPower)}) is higher than flywheel power ` +
      `(${showFigure('power', engine.flywheelPower)}).`,
    'Some power is always lost between the flywheel and the wheels, so the wheel figure is the ' +
      'lower one. One may be in the wrong field or the wrong unit (hp, PS and kW all differ).',
  );
}

function checkTopSpeed(ctx: SpecWarningCollector, input: SpecCheckInput): void {
  const { engine, drivetrain, wheels, performance } = input;
  const ratios = drivetrain?.gearRatios;
  if (!performance?.topSpeed || !ratios?.length) return;
  if (drivetrain?.finalDrive === undefined || engine?.revLimitRpm === undefined) return;
  const gears = ratios.map((r, i) => ctx.positive(r, `drivetrain.gearRatios.${i}`));
  const finalDrive = ctx.positive(drivetrain.finalDrive, 'drivetrain.finalDrive');
  const revLimitRpm = ctx.positive(engine.revLimitRpm, 'engine.revLimitRpm');
  const end = drivetrain.drivenAxle === 'front' ? 'front' : 'rear';
  const tyre = ctx.tyre(wheels?.[end]?.tyre, `wheels.${end}.tyre`);
  const claimed = ctx.read('speed', performance.topSpeed, 'mph', 'performance.topSpeed');
  if (!tyre || claimed === undefined || finalDrive === undefined) return;
  if (revLimitRpm === undefined || !gears.every((g): g is number => g !== undefined)) return;
  const top = topSpeedAtRevLimit({
    gears,
    finalDrive,
    tyreDiameterIn: tyre.diameterIn,
    revLimitRpm,
  });
  if (claimed <= top.fastest.mph * (1 + ctx.options.topSpeedTolerance)) return;
  const unit = parseUnit('speed', performance.topSpeed.unit) ?? 'mph';
  const reach = formatQuantity({ value: convert('speed', top.fastest.mph, 'mph', unit), unit });
  ctx.warn(
    'top_speed_beyond_gearing',
    'performance.topSpeed',
    `At the ${formatNumber(revLimitRpm)} rpm rev limit the gearing reaches ${reach} in gear ` +
      `${top.fastest.gear}, less than the claimed ${showFigure('speed', performance.topSpeed)}.`,
    'A car cannot go faster than its rev limit allows in its tallest gear. Check the gear ' +
      'ratios, final drive, rev limit and tyre size.',
  );
}

function checkTyreDiameters(ctx: SpecWarningCollector, { wheels }: SpecCheckInput): void {
  const front = ctx.tyre(wheels?.front?.tyre, 'wheels.front.tyre');
  const rear = ctx.tyre(wheels?.rear?.tyre, 'wheels.rear.tyre');
  if (!front || !rear || wheels?.raked) return;
  const smaller = Math.min(front.diameterIn, rear.diameterIn);
  const gap = Math.abs(front.diameterIn - rear.diameterIn) / smaller;
  if (gap <= ctx.options.tyreDiameterTolerance) return;
  const show = (d: TyreDimensions) =>
    `${formatNumber(d.diameterIn, { decimals: 1 })} in / ${formatNumber(d.diameterMm)} mm`;
  ctx.warn(
    'tyre_diameter_mismatch',
    'wheels.rear.tyre',
    `Front tyres (${show(front)}) and rear tyres (${show(rear)}) differ in diameter by ` +
      `${formatNumber(gap * 100, { decimals: 1 })}%.`,
    'Different diameters front and rear tilt the car and upset the speedometer and any ' +
      'four-wheel-drive system. If the rake is deliberate, mark the car as raked.',
  );
}

function checkFrontspacing(ctx: SpecWarningCollector, { wheels }: SpecCheckInput, end: 'front' | 'rear') {
  const w = wheels?.[end];
  if (!w?.rimWidth || (!w.offset && !w.backspacing)) return;
  const at = `wheels.${end}`;
  const rimWidthIn = ctx.read('length', w.rimWidth, 'in', `${at}.rimWidth`);
  const measured = ctx.read('length', w.backspacing, 'in', `${at}.backspacing`, true);
  const offsetMm = w.backspacing ? 0 : ctx.read('length', w.offset, 'mm', `${at}.offset`, true);
  if (rimWidthIn === undefined || offsetMm === undefined) return;
  if (w.backspacing && measured === undefined) return;
  const spacing = wheelSpacing({
    rimWidthIn,
    offsetMm,
    ...(measured !== undefined ? { measuredBackspacingIn: measured } : {}),
  });
  if (spacing.frontspacingIn >= 0) return;
  const show = (inches: number) =>
    `${formatNumber(inches, { decimals: 2 })} in ` +
    `(${formatNumber(inches * UNITS.length.in)} mm)`;
  ctx.warn(
    'negative_frontspacing',
    `${at}.${w.backspacing ? 'backspacing' : 'offset'}`,
    `A backspacing of ${show(spacing.backspacingIn)} on a ` +
      `${formatNumber(rimWidthIn, { decimals: 1 })} in rim leaves ` +
      `${show(spacing.frontspacingIn)} of frontspacing.`,
    'Backspacing plus frontspacing is the whole wheel width (rim width plus about 1 in of ' +
      'flanges), so neither can be negative. Check the rim width, the offset and its sign, ' +
      'or the backspacing.',
  );
}

function checkPowerToWeight(ctx: SpecWarningCollector, { engine, chassis }: SpecCheckInput): void {
  const power = engine?.flywheelPower ?? engine?.wheelPower;
  if (!power || !chassis?.weight) return;
  const powerField = engine?.flywheelPower ? 'engine.flywheelPower' : 'engine.wheelPower';
  const watts = ctx.read('power', power, 'W', powerField);
  const kg = ctx.read('mass', chassis.weight, 'kg', 'chassis.weight');
  if (watts === undefined || kg === undefined) return;
  const { hpPerTonne } = powerToWeight({ value: watts, unit: 'W' }, { value: kg, unit: 'kg' });
  const { min, max } = ctx.options.hpPerTonneRange;
  if (hpPerTonne >= min && hpPerTonne <= max) return;
  ctx.warn(
    'power_to_weight_implausible',
    'chassis.weight',
    `${showFigure('power', power)} for ${showFigure('mass', chassis.weight)} works out at ` +
      `${formatNumber(hpPerTonne)} hp per tonne, outside ${formatNumber(min)}–` +
      `${formatNumber(max)}.`,
    'That is far from any road or race car; usually the weight or the power is in the wrong ' +
      'unit or has a digit too many or too few.',
  );
}

/** Every figure anywhere in the input that says "measured" should say when. */
function checkMeasuredDates(ctx: SpecWarningCollector, value: unknown, path: string): void {
  if (value === null || typeof value !== 'object') return;
  if (!isFigure(value)) {
    for (const [key, child] of Object.entries(value)) {
      checkMeasuredDates(ctx, child, path ? `${path}.${key}` : key);
    }
    return;
  }
  if (value.provenance !== 'measured' || isIsoDate(value.measuredOn)) return;
  const missing = typeof value.measuredOn !== 'string' || value.measuredOn.trim() === '';
  ctx.warn(
    'measured_without_date',
    path,
    missing
      ? 'This measured figure has no date.'
      : `“${value.measuredOn}” is not a date; write it as YYYY-MM-DD.`,
    'A measured figure means more with the day it was measured: engines, dynos and scales ' +
      'all change.',
  );
}
