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
});
