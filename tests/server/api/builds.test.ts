import { describe, expect, it } from 'vitest';
import { apiClient, type ApiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { BUILD_CODE_ALPHABET } from '@shared/schemas/build';
import { RetiredBuildCode } from '@server/models/retired-build-code';

async function owner(flags: { mayOrganise?: boolean } = {}): Promise<ApiClient> {
  const { email, password } = await createUser({ ...flags, name: 'Pat Ordway' });
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return client;
}

async function newBuild(client: ApiClient, title = 'Coupe with a long story') {
  const res = await client.post('/api/builds', { title, modelYear: 1934, bodyOrigin: 'three-window coupe body, steel', style: 'hot-rod' });
  expect(res.status).toBe(201);
  return res.body.build as { id: number; code: string };
}

const measuredBore = { value: 4, unit: 'in', provenance: 'measured', measuredOn: '2026-04-02' };

describe('builds: create, read, list', () => {
  it('needs only a title and gives a short unambiguous code', async () => {
    const client = await owner();
    const bad = await client.post('/api/builds', { title: '   ', modelYear: 1700 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['modelYear', 'title']);

    const res = await client.post('/api/builds', { title: 'Minimal' });
    expect(res.status).toBe(201);
    const { build } = res.body;
    expect(build.code).toMatch(new RegExp(`^[${BUILD_CODE_ALPHABET}]{7}$`));
    expect(build.code).not.toMatch(/[01OIL]/);
    expect(build.published).toBe(false);
    expect(build.publicUrl).toBe(`http://127.0.0.1:3999/c/${build.code}`);
    expect(build.abilities).toEqual({ viewPrivate: true, edit: true, delete: true, publish: true });

    const list = await client.get('/api/builds');
    expect(list.body.builds.map((b: { id: number }) => b.id)).toEqual([build.id]);
  });

  it('keeps builds to their owner: another owner gets the same 404 as an unknown id, anonymous 401', async () => {
    const alice = await owner();
    const build = await newBuild(alice);
    const bob = await owner();
    const anonymous = await apiClient();
    const missing = await bob.get('/api/builds/999999999');
    expect(missing.status).toBe(404);
    // Someone else's build and one that does not exist answer alike, so ids reveal nothing.
    for (const res of [
      await bob.get(`/api/builds/${build.id}`),
      await bob.patch(`/api/builds/${build.id}`, { title: 'Mine now' }),
      await bob.delete(`/api/builds/${build.id}`),
      await bob.post(`/api/builds/${build.id}/weigh-ins`, { date: '2026-06-01', unit: 'kg', leftFront: 300, rightFront: 300, leftRear: 300, rightRear: 300, withDriver: false, fuelLevel: 'full' }),
    ]) {
      expect(res.status).toBe(404);
      expect(res.body).toEqual(missing.body);
    }
    expect((await bob.get('/api/builds')).body.builds).toEqual([]);
    expect((await anonymous.get(`/api/builds/${build.id}`)).status).toBe(401);
    expect((await anonymous.get('/api/builds')).status).toBe(401);
    expect((await alice.get('/api/builds/999999999')).status).toBe(404);
    expect((await alice.get('/api/builds/nope')).body.error.fields.id).toBeDefined();
  });

  it('lets an organiser own builds like anyone else (organisers are owners too)', async () => {
    const organiser = await owner({ mayOrganise: true });
    const build = await newBuild(organiser);
    expect((await organiser.get(`/api/builds/${build.id}`)).status).toBe(200);
  });
});

describe('spec sections', () => {
  it('saves a section on its own, in either unit system, and reads it back', async () => {
    const client = await owner();
    const { id } = await newBuild(client);
    const engine = {
      layout: 'V',
      cylinders: 8,
      bore: measuredBore,
      stroke: { value: 76.2, unit: 'mm', provenance: 'estimated' },
      aspiration: 'supercharged',
      superchargerType: 'twin-screw',
      flywheelPower: { value: 600, unit: 'hp', provenance: 'target' },
      madeBy: { kind: 'shop', name: 'A machine shop down the road' },
      note: 'Torque for the street.',
    };
    const res = await client.raw.put(`/api/builds/${id}/sections/engine`).set('X-CSRF-Token', client.csrf).send(engine);
    expect(res.status).toBe(200);
    expect(res.body.build.sections.engine).toEqual(engine);
    const wheels = { front: { rimDiameterIn: 17, rimWidthIn: 7, tyreSize: '215/45R17' }, rear: { rimDiameterIn: 18, rimWidthIn: 12.5, tyreSize: '315/30R18' } };
    const w = await client.raw.put(`/api/builds/${id}/sections/wheels`).set('X-CSRF-Token', client.csrf).send(wheels);
    expect(w.body.build.sections.wheels).toEqual(wheels);
    expect(w.body.build.sections.engine).toEqual(engine);
  });

  it.each([
    ['a negative bore', 'engine', { bore: { value: -4, unit: 'in', provenance: 'measured' } }, 'bore.value', /^Bore must be between 0.79 and 7.87\u00a0in \(20 to 200 mm\)\.$/],
    ['a wrong unit', 'engine', { bore: { value: 4, unit: 'furlong', provenance: 'measured' } }, 'bore.unit', /unit must be one of/],
    ['a 40-speed gearbox', 'drivetrain', { gears: Array.from({ length: 40 }, () => 1) }, 'gears', /At most 10/],
    ['a 200-inch rim', 'wheels', { front: { rimDiameterIn: 200 } }, 'front.rimDiameterIn', /at most 30/],
    ['a tyre code that does not parse', 'wheels', { rear: { tyreSize: 'fat ones' } }, 'rear.tyreSize', /does not read as a size code/],
    ['a non-numeric figure', 'chassis', { wheelbase: { value: 'long', unit: 'mm', provenance: 'estimated' } }, 'wheelbase.value', /must be a number/],
    ['a shop with no name', 'body', { madeBy: { kind: 'shop' } }, 'madeBy.name', /Name the shop/],
  ])('refuses %s with a 400 naming the field, and keeps what was saved', async (_label, kind, body, field, message) => {
    const client = await owner();
    const { id } = await newBuild(client);
    const put = (b: object) => client.raw.put(`/api/builds/${id}/sections/${kind}`).set('X-CSRF-Token', client.csrf).send(b);
    const good = kind === 'engine' ? { cylinders: 8 } : kind === 'drivetrain' ? { gears: [2.97, 1.78, 1.3, 1] } : kind === 'wheels' ? { raked: true } : kind === 'chassis' ? { frame: 'custom' } : { paint: 'Oxide red' };
    expect((await put(good)).status).toBe(200);
    const res = await put(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toMatch(message);
    const after = await client.get(`/api/builds/${id}`);
    expect(after.body.build.sections[kind]).toEqual(good);
  });

  it('refuses an unknown section kind', async () => {
    const client = await owner();
    const { id } = await newBuild(client);
    const res = await client.raw.put(`/api/builds/${id}/sections/spoilers`).set('X-CSRF-Token', client.csrf).send({});
    expect(res.status).toBe(400);
    expect(res.body.error.fields.kind).toMatch(/Section must be one of/);
  });
});

describe('private fields, credits, publishing, deleting', () => {
  it('stores private fields for the owner', async () => {
    const client = await owner();
    const { id } = await newBuild(client);
    const res = await client.raw.put(`/api/builds/${id}/private`).set('X-CSRF-Token', client.csrf).send({ vin: 'CANARY-VIN-1', plate: 'CANARY-PL', ownerPhone: '+1 555 0100', ownerAddress: '1 Canary Lane' });
    expect(res.status).toBe(200);
    expect(res.body.build.private).toEqual({ vin: 'CANARY-VIN-1', plate: 'CANARY-PL', ownerPhone: '+1 555 0100', ownerAddress: '1 Canary Lane' });
    const tooLong = await client.raw.put(`/api/builds/${id}/private`).set('X-CSRF-Token', client.csrf).send({ plate: 'X'.repeat(30) });
    expect(tooLong.body.error.fields.plate).toMatch(/at most 20/);
  });

  it('saves credits and validates each line', async () => {
    const client = await owner();
    const { id } = await newBuild(client);
    const credits = [{ role: 'paint', name: 'The owner, in a rented booth' }, { role: 'upholstery', name: 'A trim shop across town' }];
    const res = await client.raw.put(`/api/builds/${id}/credits`).set('X-CSRF-Token', client.csrf).send({ credits });
    expect(res.body.build.credits).toEqual(credits);
    const bad = await client.raw.put(`/api/builds/${id}/credits`).set('X-CSRF-Token', client.csrf).send({ credits: [{ role: '', name: 'x' }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['credits.0.role']).toBeDefined();
  });

  it('publishes and unpublishes', async () => {
    const client = await owner();
    const { id } = await newBuild(client);
    const on = await client.raw.put(`/api/builds/${id}/published`).set('X-CSRF-Token', client.csrf).send({ published: true });
    expect(on.body.build.published).toBe(true);
    const bad = await client.raw.put(`/api/builds/${id}/published`).set('X-CSRF-Token', client.csrf).send({ published: 'yes' });
    expect(bad.body.error.fields.published).toBeDefined();
  });

  it('deletes a build and retires its code for good', async () => {
    const client = await owner();
    const { id, code } = await newBuild(client);
    expect((await client.delete(`/api/builds/${id}`)).status).toBe(204);
    expect((await client.get(`/api/builds/${id}`)).status).toBe(404);
    expect(await RetiredBuildCode.count({ where: { code } })).toBe(1);
  });
});

describe('dyno runs, weigh-ins and history', () => {
  const run = {
    date: '2026-05-30',
    facility: 'A rolling-road shop',
    standard: 'SAE J1349',
    measuredAt: 'wheel',
    powerUnit: 'hp',
    torqueUnit: 'lbft',
    peakPower: 512.4,
    peakPowerRpm: 6200,
    peakTorque: 488,
    peakTorqueRpm: 4400,
    curveCsv: 'rpm,power,torque\n3000,250,437\n4400,409,488\n6200,512.4,434',
  };

  it('adds a dyno run from pasted CSV and feeds the measured power into the engine', async () => {
    const client = await owner();
    const { id } = await newBuild(client);
    await client.raw.put(`/api/builds/${id}/sections/engine`).set('X-CSRF-Token', client.csrf).send({ wheelPower: { value: 480, unit: 'hp', provenance: 'estimated' } });
    const res = await client.post(`/api/builds/${id}/dyno-runs`, run);
    expect(res.status).toBe(201);
    const [saved] = res.body.build.dynoRuns;
    expect(saved.curve).toEqual([{ rpm: 3000, power: 250, torque: 437 }, { rpm: 4400, power: 409, torque: 488 }, { rpm: 6200, power: 512.4, torque: 434 }]);
    expect(saved).not.toHaveProperty('curveCsv');

    const applied = await client.post(`/api/builds/${id}/dyno-runs/${saved.id}/apply`);
    expect(applied.status).toBe(200);
    expect(applied.body.build.sections.engine.wheelPower).toEqual({ value: 512.4, unit: 'hp', provenance: 'measured', measuredOn: '2026-05-30' });
    expect(applied.body.build.history[0]).toMatchObject({ path: 'engine.wheelPower', before: { value: 480, provenance: 'estimated' }, after: { value: 512.4, provenance: 'measured' } });
  });

  it('refuses a curve CSV with a missing column, and curves whose rpm falls back', async () => {
    const client = await owner();
    const { id } = await newBuild(client);
    const missing = await client.post(`/api/builds/${id}/dyno-runs`, { ...run, curveCsv: 'rpm,power\n3000,250' });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields.curveCsv).toMatch(/no torque column/);
    const backwards = await client.post(`/api/builds/${id}/dyno-runs`, { ...run, curveCsv: undefined, curve: [{ rpm: 5000, power: 1, torque: 1 }, { rpm: 4000, power: 1, torque: 1 }] });
    expect(backwards.body.error.fields['curve.1.rpm']).toMatch(/must rise/);
    const wrong = await client.post(`/api/builds/${id}/dyno-runs`, { ...run, standard: 'my own', date: '30/05/2026' });
    expect(Object.keys(wrong.body.error.fields).sort()).toEqual(['date', 'standard']);
    expect((await client.get(`/api/builds/${id}`)).body.build.dynoRuns).toEqual([]);
  });

  it('adds a weigh-in, feeds the measured weight and keeps the estimate as history', async () => {
    const client = await owner();
    const { id } = await newBuild(client);
    await client.patch(`/api/builds/${id}`, { weight: { value: 1250, unit: 'kg', provenance: 'estimated' } });
    const res = await client.post(`/api/builds/${id}/weigh-ins`, { date: '2026-06-01', unit: 'kg', leftFront: 330, rightFront: 322, leftRear: 318, rightRear: 317, withDriver: false, fuelLevel: 'full' });
    expect(res.status).toBe(201);
    const weighIn = res.body.build.weighIns[0];
    const applied = await client.post(`/api/builds/${id}/weigh-ins/${weighIn.id}/apply`);
    expect(applied.body.build.overview.weight).toEqual({ value: 1287, unit: 'kg', provenance: 'measured', measuredOn: '2026-06-01' });
    expect(applied.body.build.history[0]).toMatchObject({ path: 'overview.weight', before: { value: 1250, unit: 'kg', provenance: 'estimated' }, after: { value: 1287, provenance: 'measured' } });
    const bad = await client.post(`/api/builds/${id}/weigh-ins`, { date: '2026-06-01', unit: 'stone', leftFront: -1, rightFront: 322, leftRear: 318, rightRear: 317, withDriver: 'no', fuelLevel: 'full' });
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['leftFront', 'unit', 'withDriver']);
    expect((await client.delete(`/api/builds/${id}/weigh-ins/${weighIn.id}`)).status).toBe(200);
    expect((await client.post(`/api/builds/${id}/weigh-ins/${weighIn.id}/apply`)).status).toBe(404);
  });
});

describe('every build route refuses other owners and anonymous visitors', () => {
  it('answers 404 to another owner and 401 to nobody on each route, and changes nothing', async () => {
    const alice = await owner();
    const { id } = await newBuild(alice);
    const weighIn = { date: '2026-06-01', unit: 'kg', leftFront: 300, rightFront: 300, leftRear: 300, rightRear: 300, withDriver: false, fuelLevel: 'full' };
    const created = await alice.post(`/api/builds/${id}/weigh-ins`, weighIn);
    const recordId = created.body.build.weighIns[0].id;
    const routes: [method: 'get' | 'patch' | 'put' | 'post' | 'delete', path: string, body?: object][] = [
      ['get', `/api/builds/${id}`],
      ['patch', `/api/builds/${id}`, { title: 'Taken' }],
      ['put', `/api/builds/${id}/sections/engine`, { cylinders: 4 }],
      ['put', `/api/builds/${id}/private`, { vin: 'X' }],
      ['put', `/api/builds/${id}/credits`, { credits: [] }],
      ['put', `/api/builds/${id}/published`, { published: true }],
      ['post', `/api/builds/${id}/weigh-ins`, weighIn],
      ['post', `/api/builds/${id}/weigh-ins/${recordId}/apply`],
      ['delete', `/api/builds/${id}/weigh-ins/${recordId}`],
      ['post', `/api/builds/${id}/dyno-runs/${recordId}/apply`],
      ['delete', `/api/builds/${id}`],
    ];
    const bob = await owner();
    const nobody = await apiClient();
    for (const [method, path, body] of routes) {
      for (const [client, status] of [[bob, 404], [nobody, 401]] as const) {
        const req = client.raw[method](path);
        const res = method === 'get' ? await req : await req.set('X-CSRF-Token', client.csrf).send(body ?? {});
        expect(res.status, `${method.toUpperCase()} ${path}`).toBe(status);
      }
    }
    const after = (await alice.get(`/api/builds/${id}`)).body.build;
    expect(after.overview.title).toBe('Coupe with a long story');
    expect(after.published).toBe(false);
    expect(after.weighIns).toHaveLength(1);
    expect(after.sections.engine).toBeUndefined();
  });
});

describe('evidence photos', () => {
  it('lets a measured figure point at one of the build’s own photos, and no one else’s', async () => {
    const { createBuild: makeBuild } = await import('../../support/build-factory');
    const { Photo } = await import('@server/models/photo');
    const client = await owner();
    const { id } = await newBuild(client);
    const mine = await Photo.create({ buildId: id, storageKey: 'a'.repeat(24) + Date.now().toString(16).padStart(8, '0').slice(-8), width: 480, height: 300, variants: [{ width: 480, height: 300 }] });
    const other = await createUser();
    const theirs = await makeBuild(other.user.id, { title: 'Not yours' });
    const foreign = await Photo.create({ buildId: theirs.id, storageKey: 'b'.repeat(24) + Date.now().toString(16).padStart(8, '0').slice(-8), width: 480, height: 300, variants: [{ width: 480, height: 300 }] });
    const figure = (photoId: number) => ({ wheelbase: { value: 2743, unit: 'mm', provenance: 'measured', measuredOn: '2026-03-01', evidencePhotoId: photoId } });
    const ok = await client.raw.put(`/api/builds/${id}/sections/chassis`).set('X-CSRF-Token', client.csrf).send(figure(mine.id));
    expect(ok.status).toBe(200);
    expect(ok.body.build.sections.chassis.wheelbase.evidencePhotoId).toBe(mine.id);
    const bad = await client.raw.put(`/api/builds/${id}/sections/chassis`).set('X-CSRF-Token', client.csrf).send(figure(foreign.id));
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['wheelbase.evidencePhotoId']).toMatch(/not one of this build/);
    const weight = await client.patch(`/api/builds/${id}`, { weight: { value: 1287, unit: 'kg', provenance: 'measured', measuredOn: '2026-06-01', evidencePhotoId: foreign.id } });
    expect(weight.body.error.fields['weight.evidencePhotoId']).toBeDefined();
  });
});
