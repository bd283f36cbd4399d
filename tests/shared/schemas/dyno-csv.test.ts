import { describe, expect, it } from 'vitest';
import { dynoCurveFromCsv, parseDynoCsv, readDecimal } from '@shared/schemas/dyno-csv';
import { DynoRunCreateSchema } from '@shared/schemas/build';
import { curvePeaks } from '@shared/calc/dyno';

// Exports are invented here in the shapes dyno software writes: a header in its own words, perhaps
// lines about the run above it and a units row under it, commas or semicolons, decimal commas.

const ok = (text: string) => {
  const r = parseDynoCsv(text);
  if (!r.ok) throw new Error(r.message);
  return r;
};

describe('reading a dyno curve from CSV', () => {
  it('reads the short headers "RPM,HP,TQ", power in hp and torque in the run’s unit', () => {
    const r = ok('RPM,HP,TQ\n3000,210.5,368.6\n3500,250,375.1\n');
    expect(r.points).toEqual([
      { rpm: 3000, power: 210.5, torque: 368.6 },
      { rpm: 3500, power: 250, torque: 375.1 },
    ]);
    expect(r.units).toEqual({ power: 'hp', torque: null });
  });

  it.each([
    ['Horsepower, Torque (lb-ft), rpm', 'hp', 'lbft'],
    ['Engine Speed (rpm),Power (kW),Torque (Nm)', 'kW', 'Nm'],
    ['rpm,power,torque', null, null],
    ['ENGINE SPEED,POWER [PS],TORQUE [NM]', 'PS', 'Nm'],
    ['Rpm,Whp,Torque lb-ft', 'hp', 'lbft'],
  ])('names the columns "%s" in any order and case, with or without units', (header, power, torque) => {
    const order = header.split(',').map((h) => (/rpm|speed/i.test(h) ? 'rpm' : /torque|tq/i.test(h) ? 'torque' : 'power'));
    const row = order.map((c) => ({ rpm: '4000', power: '300', torque: '400' })[c]).join(',');
    const r = ok(`${header}\n${row}`);
    expect(r.points).toEqual([{ rpm: 4000, power: 300, torque: 400 }]);
    expect(r.units).toEqual({ power, torque });
  });

  it('reads semicolons with decimal commas, passing over other columns', () => {
    const r = ok('Drehzahl 1/min;Leistung;Power (kW);Torque (Nm);AFR\n2500;x;120,5;460,25;12,8\n3000;x;150,75;480;12,6');
    expect(r.points).toEqual([
      { rpm: 2500, power: 120.5, torque: 460.25 },
      { rpm: 3000, power: 150.75, torque: 480 },
    ]);
    expect(r.columns.power.name).toBe('Power (kW)');
  });

  it('reads tabs, quoted decimal commas in a comma file, a units row and lines about the run above the header', () => {
    const r = ok('Run 3 of the day\nOperator: shop bench\n\nRPM\tHP\tTQ\nrpm\thp\tlb-ft\n5500\t342.1\t327\n');
    expect(r.points).toEqual([{ rpm: 5500, power: 342.1, torque: 327 }]);
    expect(r.units).toEqual({ power: 'hp', torque: 'lbft' });
    expect(ok('RPM,HP,TQ\n6000,"338,4","296,2"').points).toEqual([{ rpm: 6000, power: 338.4, torque: 296.2 }]);
  });

  it('reads thousands separators and both decimal marks', () => {
    expect(readDecimal('5 500')).toBe(5500);
    expect(readDecimal('1.234,5')).toBe(1234.5);
    expect(readDecimal('1,234.5')).toBe(1234.5);
    expect(readDecimal('312,4')).toBe(312.4);
    expect(readDecimal('-')).toBeNull();
    expect(readDecimal('12a')).toBeNull();
  });

  it('names the missing column, the line and the cell that is not a number', () => {
    expect(parseDynoCsv('rpm;power\n3000;200')).toEqual({ ok: false, message: 'The header has no torque column (found: rpm, power). Name them, for example RPM, HP and TQ.' });
    expect(parseDynoCsv('Speed (mph),Boost\n30,5')).toMatchObject({ ok: false, message: expect.stringMatching(/^The header has no rpm or power or torque column \(found: Speed \(mph\), Boost\)/) });
    expect(parseDynoCsv('RPM,HP,TQ\n3000,210,368\n3500,n/a,375')).toEqual({ ok: false, message: 'Line 3: "n/a" in the HP column is not a number.' });
    expect(parseDynoCsv('RPM,HP,TQ\n3000,210')).toEqual({ ok: false, message: 'Line 2 has no TQ value.' });
    expect(parseDynoCsv('RPM,HP,TQ\n3000,210,5,368,2')).toEqual({ ok: false, message: 'Line 2 has more cells than the header. Decimal commas need semicolons or tabs between the cells.' });
    expect(parseDynoCsv('RPM,HP,TQ')).toEqual({ ok: false, message: 'Give a header row naming the rpm, power and torque columns, then at least one row of numbers.' });
  });

  it('converts a column whose header names another unit into the run’s units', () => {
    // 100 kW = 134.10 hp and 400 N·m = 295.02 lb·ft (1 hp = 745.69987 W, 1 lbf·ft = 1.3558179 N·m; NIST SP 811).
    const r = dynoCurveFromCsv('RPM;Power (kW);Torque (Nm)\n4000;100;400', { powerUnit: 'hp', torqueUnit: 'lbft' });
    expect(r).toMatchObject({ ok: true, points: [{ rpm: 4000, power: 134.1, torque: 295.02 }] });
    expect(dynoCurveFromCsv('RPM,HP,TQ\n4000,300,400', { powerUnit: 'kW', torqueUnit: 'Nm' })).toMatchObject({ ok: true, points: [{ rpm: 4000, power: 223.71, torque: 400 }] });
  });

  it('turns an export into the run’s curve when a run is saved, and refuses a broken one on the pasted field', () => {
    const run = { date: '2026-05-01', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft', peakPower: 342, peakPowerRpm: 5500, peakTorque: 369, peakTorqueRpm: 4000 } as const;
    const saved = DynoRunCreateSchema.parse({ ...run, curveCsv: 'RPM;HP;TQ\n4000;281,4;369\n5500;342;327' });
    expect(saved.curve).toEqual([
      { rpm: 4000, power: 281.4, torque: 369 },
      { rpm: 5500, power: 342, torque: 327 },
    ]);
    const refused = DynoRunCreateSchema.safeParse({ ...run, curveCsv: 'RPM,HP\n4000,281' });
    expect(refused.success).toBe(false);
    expect(refused.error!.issues).toEqual([expect.objectContaining({ path: ['curveCsv'], message: expect.stringContaining('no torque column') })]);
  });

  it('refuses at once a negative or out-of-range cell, naming its line and column, as saving would', () => {
    const units = { powerUnit: 'hp', torqueUnit: 'lbft' } as const;
    expect(dynoCurveFromCsv('RPM,HP,TQ\n3000,-150,262\n4000,220,289', units)).toEqual({ ok: false, message: 'Line 2: -150 in the HP column is below 0: power can’t be negative.' });
    expect(dynoCurveFromCsv('RPM,HP,TQ\n3000,150,262\n4000,220,-1', units)).toEqual({ ok: false, message: 'Line 3: -1 in the TQ column is below 0: torque can’t be negative.' });
    expect(dynoCurveFromCsv('RPM,HP,TQ\n200,150,262', units)).toEqual({ ok: false, message: 'Line 2: 200 in the RPM column must be at least 300 rpm.' });
    expect(dynoCurveFromCsv('RPM,HP,TQ\n4000,5001,262', units)).toEqual({ ok: false, message: 'Line 2: 5001 in the HP column must be at most 5,000 hp.' });
    // 4000 kW = 5364.1 hp (1 hp = 745.69987 W; NIST SP 811): within the kW the file gives, over what a run in hp holds.
    expect(dynoCurveFromCsv('Run 1\nRPM;Power (kW);Torque (Nm)\n4000;4000;400', units)).toEqual({ ok: false, message: 'Line 3: 4000 in the Power (kW) column is 5,364 hp; it must be at most 5,000 hp.' });
  });

  it('sorts rows given in falling rpm and refuses two rows at one rpm, naming both lines', () => {
    const r = dynoCurveFromCsv('RPM,HP,TQ\n6000,338,296\n5000,334,351\n4000,281,369', { powerUnit: 'hp', torqueUnit: 'lbft' });
    expect(r).toMatchObject({ ok: true, points: [{ rpm: 4000 }, { rpm: 5000 }, { rpm: 6000 }], lines: [4, 3, 2] });
    expect(dynoCurveFromCsv('RPM,HP,TQ\n4000,281,369\n5000,334,351\n4000,282,368', { powerUnit: 'hp', torqueUnit: 'lbft' })).toEqual({ ok: false, message: 'Lines 2 and 4 both give 4,000 rpm: keep one row for each rpm.' });
  });

  it('saves the same refusals the preview shows, on the pasted field', () => {
    const run = { date: '2026-05-01', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft' } as const;
    const refused = DynoRunCreateSchema.safeParse({ ...run, curveCsv: 'RPM,HP,TQ\n3000,-150,262\n4000,220,289' });
    expect(refused.error!.issues).toEqual([expect.objectContaining({ path: ['curveCsv'], message: 'Line 2: -150 in the HP column is below 0: power can’t be negative.' })]);
    const saved = DynoRunCreateSchema.parse({ ...run, curveCsv: 'RPM,HP,TQ\n6000,338.1,296\n5500,342.4,327\n4000,281.3,369.4' });
    expect(saved.curve.map((p) => p.rpm)).toEqual([4000, 5500, 6000]);
  });
});

describe('the peaks of a dyno run', () => {
  const run = { date: '2026-05-01', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft' } as const;

  it('reads the highest power and torque and their rpm from the curve', () => {
    expect(curvePeaks([{ rpm: 4000, power: 281.3, torque: 369.4 }, { rpm: 5500, power: 342.4, torque: 327 }, { rpm: 6000, power: 338.1, torque: 296 }])).toEqual({ peakPower: 342.4, peakPowerRpm: 5500, peakTorque: 369.4, peakTorqueRpm: 4000 });
    expect(curvePeaks([])).toBeNull();
  });

  it('fills the peaks left out from the curve, pasted or typed, and keeps the ones given', () => {
    const pasted = DynoRunCreateSchema.parse({ ...run, curveCsv: 'RPM,HP,TQ\n4000,281.3,369.4\n5500,342.4,327\n6000,338.1,296' });
    expect(pasted).toMatchObject({ peakPower: 342.4, peakPowerRpm: 5500, peakTorque: 369.4, peakTorqueRpm: 4000 });
    const typed = DynoRunCreateSchema.parse({ ...run, peakPower: 345, curve: [{ rpm: 4000, power: 281, torque: 369 }, { rpm: 5500, power: 342, torque: 327 }] });
    expect(typed).toMatchObject({ peakPower: 345, peakPowerRpm: 5500, peakTorque: 369, peakTorqueRpm: 4000 });
  });

  it('asks for each peak by its label when there is no curve to read them from', () => {
    const refused = DynoRunCreateSchema.safeParse({ ...run, peakTorque: 300 });
    expect(refused.error!.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['peakPower', 'Enter the peak power.'],
      ['peakPowerRpm', 'Enter the rpm at peak power.'],
      ['peakTorqueRpm', 'Enter the rpm at peak torque.'],
    ]);
    const notWhole = DynoRunCreateSchema.safeParse({ ...run, peakPower: 300, peakPowerRpm: 5500.5, peakTorque: 300, peakTorqueRpm: 4000 });
    expect(notWhole.error!.issues).toEqual([expect.objectContaining({ path: ['peakPowerRpm'], message: 'Rpm at peak power must be a whole number.' })]);
  });
});
