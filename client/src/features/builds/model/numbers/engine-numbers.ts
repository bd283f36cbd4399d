import { boreStrokeRatio, displacement, DRIVETRAIN_LOSS, DRIVETRAIN_LOSS_NOTE, flywheelPowerFromWheel, impliedDrivetrainLoss, powerToWeight, formatQuantity, wheelPowerFromFlywheel, formatPercent, type UnitSystem } from '@shared/calc';
import { shownFigures } from '@shared/build-sheet/key-figures';
import { attempt, firmness, fmt, num, read, show } from './read';
import { other, type NumberGroup, type NumberRow, type NumbersInput } from './types';

/** Metric leads with cm³ (litres beside it), imperial with cubic inches. */
const volume = (cm3: number, system: UnitSystem) => (system === 'metric' ? formatQuantity({ value: cm3, unit: 'cm3' }) : show('volume', cm3, 'cm3', 'imperial'));
const volumeOther = (cm3: number, system: UnitSystem) =>
  system === 'metric' ? `${formatQuantity({ value: cm3 / 1000, unit: 'L' })} · ${show('volume', cm3, 'cm3', 'imperial')}` : `${formatQuantity({ value: cm3, unit: 'cm3' })} · ${formatQuantity({ value: cm3 / 1000, unit: 'L' })}`;

export function engineNumbers({ sections, system }: NumbersInput): NumberGroup {
  const e = sections.engine ?? {};
  const bore = read('length', e.bore, 'mm');
  const stroke = read('length', e.stroke, 'mm');
  const cylinders = num(e.cylinders);
  const rows: NumberRow[] = [];
  let hint: string | undefined;
  if (bore !== undefined && stroke !== undefined && cylinders !== undefined) {
    const d = attempt(() => displacement({ bore, stroke, unit: 'mm', cylinders }));
    if (d.ok) {
      rows.push({ label: 'Displacement (bore × stroke × cylinders)', value: volume(d.value.cm3, system), other: volumeOther(d.value.cm3, system), ...firmness(e.bore, e.stroke) });
      const stated = read('volume', e.displacement, 'cm3');
      if (stated !== undefined) rows.push({ label: 'Displacement on the sheet', value: volume(stated, system), other: volumeOther(stated, system), ...firmness(e.displacement) });
    } else hint = 'Bore, stroke and cylinders must all be above zero (cylinders a whole number).';
    const ratio = attempt(() => boreStrokeRatio(bore, stroke));
    if (ratio.ok) rows.push({ label: 'Bore ÷ stroke', value: fmt(ratio.value, 2), other: ratio.value > 1.005 ? 'oversquare' : ratio.value < 0.995 ? 'undersquare' : 'square', ...firmness(e.bore, e.stroke) });
  } else hint = 'Enter bore, stroke and cylinders to work out the displacement.';
  return { id: 'engine', title: 'Engine', section: 'engine', rows, ...(hint ? { hint } : {}) };
}

export function powerNumbers({ sections, weight, weighIns, dynoRuns, system }: NumbersInput): NumberGroup {
  const e = sections.engine ?? {};
  const fly = read('power', e.flywheelPower, 'hp');
  const wheel = read('power', e.wheelPower, 'hp');
  const rows: NumberRow[] = [];
  const notes: string[] = [];
  const lossText = formatPercent(DRIVETRAIN_LOSS.manualRearDrive * 100, { decimals: 0 });
  if (fly !== undefined && wheel === undefined) {
    const est = attempt(() => wheelPowerFromFlywheel({ value: fly, unit: 'hp' }));
    if (est.ok) rows.push({ label: `At the wheels (${lossText} loss)`, value: show('power', est.value.value, 'hp', system), other: show('power', est.value.value, 'hp', other(system)), estimate: true, ...firmness(e.flywheelPower) });
  } else if (wheel !== undefined && fly === undefined) {
    const est = attempt(() => flywheelPowerFromWheel({ value: wheel, unit: 'hp' }));
    if (est.ok) rows.push({ label: `At the flywheel (${lossText} loss)`, value: show('power', est.value.value, 'hp', system), other: show('power', est.value.value, 'hp', other(system)), estimate: true, ...firmness(e.wheelPower) });
  } else if (wheel !== undefined && fly !== undefined) {
    const loss = attempt(() => impliedDrivetrainLoss({ value: fly, unit: 'hp' }, { value: wheel, unit: 'hp' }));
    // A negative loss is impossible (the wheels cannot make more than the engine): said, never shown as a figure.
    if (loss.ok && Number.isFinite(loss.value) && loss.value < 0) notes.push('No drivetrain loss to show: the wheel power is above the flywheel power, so one of the two is wrong.');
    else if (loss.ok && Number.isFinite(loss.value)) rows.push({ label: 'Drivetrain loss the two figures imply', value: formatPercent(loss.value * 100), ...firmness(e.flywheelPower, e.wheelPower) });
  }
  if (rows.some((r) => r.estimate)) notes.push(DRIVETRAIN_LOSS_NOTE + ' (common practice)');
  // Power to weight from the figures the build shows everywhere (the shared rule: measured first, dyno and weigh-ins included).
  const shown = shownFigures({ sections, weight, dynoRuns, weighIns });
  const power = read('power', shown.power?.figure, 'hp');
  const kg = read('mass', shown.weight?.figure, 'kg');
  let hint: string | undefined;
  if (power !== undefined && kg !== undefined) {
    const pw = attempt(() => powerToWeight({ value: power, unit: 'hp' }, { value: kg, unit: 'kg' }));
    if (pw.ok) {
      const at = shown.power?.at === 'wheel' ? 'wheels' : 'flywheel';
      const firm = firmness(shown.power?.figure, shown.weight?.figure);
      const hpPerTonne = `${fmt(pw.value.hpPerTonne)} hp per tonne`;
      const wPerKg = `${fmt(pw.value.wPerKg, 1)} W/kg`;
      rows.push({ label: `Power to weight (${at})`, value: system === 'metric' ? wPerKg : hpPerTonne, other: system === 'metric' ? hpPerTonne : wPerKg, ...firm });
      rows.push({ label: 'Weight to power', value: system === 'metric' ? `${fmt(pw.value.kgPerKw, 2)} kg/kW` : `${fmt(pw.value.lbPerHp, 2)} lb/hp`, other: system === 'metric' ? `${fmt(pw.value.lbPerHp, 2)} lb/hp` : `${fmt(pw.value.kgPerKw, 2)} kg/kW`, ...firm });
    }
  } else if (power === undefined) hint = 'Enter a power figure (engine) to see the estimates and power to weight.';
  else hint = 'Enter the build’s weight (overview) for power to weight.';
  return { id: 'power', title: 'Power', section: 'engine', rows, notes, ...(hint && !rows.length ? { hint } : hint ? { notes: [...notes, hint] } : {}) };
}
