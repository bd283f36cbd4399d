import { describe, expect, it } from 'vitest';
import { apiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';

// A dyno export sent as the run's pasted curve: the route reads it with the shared parser, saves
// the curve in the run's units and answers a broken file with one message on the field.

async function ownerWithBuild() {
  const { email, password } = await createUser();
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  const res = await client.post('/api/builds', { title: 'Dyno day coupe' });
  expect(res.status).toBe(201);
  return { client, id: res.body.build.id as number };
}

const run = { date: '2026-05-30', standard: 'DIN 70020', measuredAt: 'flywheel', powerUnit: 'hp', torqueUnit: 'lbft', peakPower: 300, peakPowerRpm: 6000, peakTorque: 300, peakTorqueRpm: 4000 };

describe('dyno exports through the API', () => {
  it('saves a semicolon export with decimal commas and metric headers, converted to the run’s units', async () => {
    const { client, id } = await ownerWithBuild();
    const curveCsv = ['Bench export, run 2', 'Engine Speed [rpm];Power (kW);Torque (Nm);Lambda', '4000;150,5;406,7;0,88', '6000;223,7;355,0;0,86'].join('\r\n');
    const res = await client.post(`/api/builds/${id}/dyno-runs`, { ...run, curveCsv });
    expect(res.status).toBe(201);
    // 150.5 kW = 201.82 hp, 223.7 kW = 299.99 hp; 406.7 N·m = 299.97 lb·ft, 355 N·m = 261.83 lb·ft (1 hp = 745.69987 W, 1 lbf·ft = 1.3558179 N·m).
    expect(res.body.build.dynoRuns[0].curve).toEqual([
      { rpm: 4000, power: 201.82, torque: 299.97 },
      { rpm: 6000, power: 299.99, torque: 261.83 },
    ]);
  });

  it('refuses a file whose cells are not numbers, naming the line, the column and the field', async () => {
    const { client, id } = await ownerWithBuild();
    const res = await client.post(`/api/builds/${id}/dyno-runs`, { ...run, curveCsv: 'RPM,HP,TQ\n4000,201,300\n6000,--,262' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ curveCsv: 'Line 3: "--" in the HP column is not a number.' });
  });

  it('refuses a negative or out-of-range cell with its line and column, as the form’s preview does', async () => {
    const { client, id } = await ownerWithBuild();
    const negative = await client.post(`/api/builds/${id}/dyno-runs`, { ...run, curveCsv: 'RPM,HP,TQ\n3000,-150,262\n4000,220,289' });
    expect(negative.status).toBe(400);
    expect(negative.body.error.fields).toEqual({ curveCsv: 'Line 2: -150 in the HP column is below 0: power can’t be negative.' });
    const tooHigh = await client.post(`/api/builds/${id}/dyno-runs`, { ...run, curveCsv: 'RPM,HP,TQ\n3000,150,262\n40000,220,289' });
    expect(tooHigh.body.error.fields).toEqual({ curveCsv: 'Line 3: 40000 in the RPM column must be at most 25,000 rpm.' });
  });

  it('saves rows given in falling rpm as a rising curve, and reads the peaks left out from it', async () => {
    const { client, id } = await ownerWithBuild();
    const { peakPower: _p, peakPowerRpm: _pr, peakTorque: _t, peakTorqueRpm: _tr, ...noPeaks } = run;
    const res = await client.post(`/api/builds/${id}/dyno-runs`, { ...noPeaks, curveCsv: 'RPM,HP,TQ\n6000,338.1,296\n5500,342.4,327\n4000,281.3,369.4' });
    expect(res.status).toBe(201);
    const saved = res.body.build.dynoRuns[0];
    expect(saved.curve.map((p: { rpm: number }) => p.rpm)).toEqual([4000, 5500, 6000]);
    expect(saved).toMatchObject({ peakPower: 342.4, peakPowerRpm: 5500, peakTorque: 369.4, peakTorqueRpm: 4000 });
  });

  it('asks for the peaks by name when no curve is given', async () => {
    const { client, id } = await ownerWithBuild();
    const { peakPower: _p, peakTorqueRpm: _tr, ...partial } = run;
    const res = await client.post(`/api/builds/${id}/dyno-runs`, partial);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ peakPower: 'Enter the peak power.', peakTorqueRpm: 'Enter the rpm at peak torque.' });
  });
});
