import { describe, expect, it } from 'vitest';
import { Photo } from '@server/models/photo';
import { DynoRun } from '@server/models/dyno-run';
import { PASSWORD_CHANGE_LIMIT } from '@server/middlewares/rate-limits';
import { apiClient, type ApiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';

// Bad bodies, bad text, bad dates, borrowed evidence photos and loosely read ids: each is a clear
// 4xx in the one error shape, and nothing that was stored changes.

async function owner(): Promise<{ client: ApiClient; userId: number; email: string; password: string }> {
  const { user, email, password } = await createUser({ name: 'Robin Harrow' });
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return { client, userId: user.id, email, password };
}

const put = (client: ApiClient, path: string, body: unknown) => client.raw.put(path).set('X-CSRF-Token', client.csrf).send(body as object);
const photoRow = (buildId: number) =>
  Photo.create({ buildId, storageKey: [...crypto.getRandomValues(new Uint8Array(16))].map((b) => b.toString(16).padStart(2, '0')).join(''), width: 480, height: 300, variants: [{ width: 480, height: 300 }] });

/** An owner with a build whose body section, private fields and card settings hold something. */
async function filledBuild() {
  const who = await owner();
  const { client } = who;
  const created = await client.post('/api/builds', { title: 'Sedan delivery' });
  const id = created.body.build.id as number;
  expect((await put(client, `/api/builds/${id}/sections/body`, { paint: 'Two-tone teal over bone' })).status).toBe(200);
  expect((await put(client, `/api/builds/${id}/private`, { vin: 'VIN-0001', plate: 'HOT 34' })).status).toBe(200);
  expect((await put(client, `/api/builds/${id}/card-settings`, { design: 'compact', paper: 'a4' })).status).toBe(200);
  const stored = async () => {
    const build = (await client.get(`/api/builds/${id}`)).body.build;
    const card = (await client.get(`/api/builds/${id}/card-settings`)).body.settings;
    return { body: build.sections.body, private: build.private, card };
  };
  return { ...who, id, stored, before: await stored() };
}

describe('bodies that are not JSON never replace saved data', () => {
  it('answers 415 to text, form data, XML and a body with no type, and 400 to an empty or all-unknown body', async () => {
    const { client, id, stored, before } = await filledBuild();
    const targets = [`/api/builds/${id}/sections/body`, `/api/builds/${id}/private`, `/api/builds/${id}/card-settings`];
    for (const path of targets) {
      for (const [type, body] of [
        ['text/plain', 'paint=nothing'],
        ['application/x-www-form-urlencoded', 'paint=&vin='],
        ['application/xml', '<section><paint/></section>'],
        ['multipart/form-data; boundary=x', '--x\r\nContent-Disposition: form-data; name="paint"\r\n\r\n\r\n--x--\r\n'],
      ] as const) {
        const res = await client.raw.put(path).set('X-CSRF-Token', client.csrf).set('Content-Type', type).send(body);
        expect(res.status, `${path} ${type}`).toBe(415);
        expect(res.body.error.code).toBe('UNSUPPORTED_MEDIA_TYPE');
      }
      // A body with no Content-Type at all.
      const untyped = await client.raw.put(path).set('X-CSRF-Token', client.csrf).unset('Content-Type').send(Buffer.from('{"paint":""}'));
      expect(untyped.status, `${path} untyped`).toBe(415);
      // JSON declared, zero bytes sent; and nothing at all.
      const empty = await client.raw.put(path).set('X-CSRF-Token', client.csrf).set('Content-Type', 'application/json').send('');
      expect(empty.status, `${path} empty`).toBe(400);
      expect(empty.body.error.message).toMatch(/no body/);
      const none = await client.raw.put(path).set('X-CSRF-Token', client.csrf);
      expect(none.status, `${path} none`).toBe(400);
      // Only keys the schema does not know: 400 naming them.
      const unknown = await put(client, path, { colour: 'red', vinNumber: 'X' });
      expect(unknown.status, `${path} unknown keys`).toBe(400);
      expect(Object.keys(unknown.body.error.fields).sort()).toEqual(['colour', 'vinNumber']);
    }
    expect(await stored()).toEqual(before);
    // The other writes too: a dyno run as text is refused, not read as an empty run.
    const dyno = await client.raw.post(`/api/builds/${id}/dyno-runs`).set('X-CSRF-Token', client.csrf).set('Content-Type', 'text/plain').send('date=2026-01-01');
    expect(dyno.status).toBe(415);
    // `{}` is still the editor's deliberate "clear this section".
    expect((await put(client, `/api/builds/${id}/sections/body`, {})).body.build.sections.body).toEqual({});
  });
});

describe('text the database cannot store is a 400 naming the field', () => {
  const nul = 'Candy\u0000red';
  const lone = 'Pearl \uD83D white';
  const lowSurrogate = '\uDE00 flake';

  it('refuses NUL and unpaired surrogates in every kind of text, and keeps what was stored', async () => {
    const { client, id, stored, before } = await filledBuild();
    const cases: [path: string, method: 'put' | 'post' | 'patch', body: (bad: string) => object, field: string][] = [
      [`/api/builds/${id}/sections/body`, 'put', (bad) => ({ paint: bad }), 'paint'],
      [`/api/builds/${id}/sections/body`, 'put', (bad) => ({ note: bad }), 'note'],
      [`/api/builds/${id}/sections/engine`, 'put', (bad) => ({ madeBy: { kind: 'shop', name: bad } }), 'madeBy.name'],
      [`/api/builds/${id}/sections/extra`, 'put', (bad) => ({ lines: [{ label: 'Horn', value: bad }] }), 'lines.0.value'],
      [`/api/builds/${id}/credits`, 'put', (bad) => ({ credits: [{ role: 'paint', name: bad }] }), 'credits.0.name'],
      [`/api/builds/${id}/private`, 'put', (bad) => ({ ownerAddress: bad }), 'ownerAddress'],
      [`/api/builds/${id}`, 'patch', (bad) => ({ story: bad }), 'story'],
      [`/api/builds/${id}`, 'patch', (bad) => ({ title: bad }), 'title'],
      [`/api/builds/${id}/dyno-runs`, 'post', (bad) => ({ ...dynoRun('2026-05-01'), facility: bad }), 'facility'],
      [`/api/builds/${id}/dyno-runs`, 'post', (bad) => ({ ...dynoRun('2026-05-01'), note: bad }), 'note'],
      [`/api/builds/${id}/weigh-ins`, 'post', (bad) => ({ ...weighIn('2026-05-01'), note: bad }), 'note'],
      ['/api/account', 'patch', (bad) => ({ name: bad }), 'name'],
    ];
    for (const [path, method, body, field] of cases) {
      for (const bad of [nul, lone, lowSurrogate, 'bell\u0007', 'next line\u0085']) {
        const res = await client.raw[method](path).set('X-CSRF-Token', client.csrf).send(body(bad));
        expect(res.status, `${method} ${path} ${field} ${JSON.stringify(bad)}`).toBe(400);
        expect(res.body.error.fields[field], `${path} ${field}`).toMatch(/cannot keep/);
      }
    }
    expect(await stored()).toEqual(before);
    const build = (await client.get(`/api/builds/${id}`)).body.build;
    expect(build.overview.title).toBe('Sedan delivery');
    expect(build.dynoRuns).toEqual([]);
    expect(build.weighIns).toEqual([]);
  });

  it('keeps tabs, line breaks (CRLF stored as LF) and whole emoji', async () => {
    const { client, id } = await filledBuild();
    const res = await put(client, `/api/builds/${id}/sections/body`, { paint: 'Teal\tbone 🎨', note: 'First coat\r\nSecond coat' });
    expect(res.status).toBe(200);
    expect(res.body.build.sections.body).toMatchObject({ paint: 'Teal\tbone 🎨', note: 'First coat\nSecond coat' });
  });
});

const dynoRun = (date: string) => ({ date, standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft', peakPower: 412, peakPowerRpm: 6100, peakTorque: 398, peakTorqueRpm: 4400 });
const weighIn = (date: string) => ({ date, unit: 'kg', leftFront: 350, rightFront: 340, leftRear: 310, rightRear: 320, withDriver: false, fuelLevel: 'half' });

describe('dates are real calendar dates in a sane range', () => {
  it('refuses year 0000, 1899, impossible days and the far future, naming the field', async () => {
    const { client, id } = await filledBuild();
    for (const date of ['0000-01-01', '1899-12-31', '2023-02-29', '2026-13-01', `${new Date().getUTCFullYear() + 2}-01-01`, '20266-01-01']) {
      for (const [path, body] of [[`/api/builds/${id}/dyno-runs`, dynoRun(date)], [`/api/builds/${id}/weigh-ins`, weighIn(date)]] as const) {
        const res = await client.post(path, body);
        expect(res.status, `${path} ${date}`).toBe(400);
        expect(res.body.error.fields.date, `${path} ${date}`).toBeDefined();
      }
      const figure = await put(client, `/api/builds/${id}/sections/chassis`, { wheelbase: { value: 2743, unit: 'mm', provenance: 'measured', measuredOn: date } });
      expect(figure.status, `measuredOn ${date}`).toBe(400);
      expect(figure.body.error.fields['wheelbase.measuredOn']).toBeDefined();
    }
    const build = (await client.get(`/api/builds/${id}`)).body.build;
    expect([build.dynoRuns.length, build.weighIns.length, build.sections.chassis]).toEqual([0, 0, undefined]);
    expect((await client.post(`/api/builds/${id}/dyno-runs`, dynoRun('1964-02-29'))).status).toBe(201);
    expect((await client.post(`/api/builds/${id}/weigh-ins`, weighIn(`${new Date().getUTCFullYear() + 1}-12-31`))).status).toBe(201);
  });
});

describe('evidence photos inside lists', () => {
  it('must be the build’s own photos in a tube line too, and a refused one never reaches the public JSON', async () => {
    const { client, id, userId } = await filledBuild();
    const mine = await photoRow(id);
    const sameOwnerOtherBuild = await photoRow((await createBuild(userId, { title: 'Another of mine' })).id);
    const stranger = await createUser();
    const theirs = await photoRow((await createBuild(stranger.user.id, { title: 'Not yours' })).id);
    const tubes = (photoId: number) => ({
      tubes: [
        { use: 'main rails', shape: 'rectangular', outside: { value: 50, unit: 'mm', provenance: 'estimated' }, height: { value: 100, unit: 'mm', provenance: 'estimated' }, wall: { value: 3, unit: 'mm', provenance: 'estimated' } },
        { use: 'cage', shape: 'round', outside: { value: 44.5, unit: 'mm', provenance: 'measured', measuredOn: '2026-02-01', evidencePhotoId: photoId }, wall: { value: 2.4, unit: 'mm', provenance: 'estimated' } },
      ],
    });
    for (const photoId of [theirs.id, sameOwnerOtherBuild.id, 2_000_000_000]) {
      const res = await put(client, `/api/builds/${id}/sections/chassis`, tubes(photoId));
      expect(res.status, String(photoId)).toBe(400);
      expect(res.body.error.fields['tubes.1.outside.evidencePhotoId']).toMatch(/not one of this build/);
    }
    expect((await client.get(`/api/builds/${id}`)).body.build.sections.chassis).toBeUndefined();
    const ok = await put(client, `/api/builds/${id}/sections/chassis`, tubes(mine.id));
    expect(ok.status).toBe(200);
    expect(ok.body.build.sections.chassis.tubes[1].outside.evidencePhotoId).toBe(mine.id);
  });
});

describe('path ids are decimal digits only', () => {
  it('answers 400 to hex, exponent and padded ids instead of opening another record', async () => {
    const { client, id } = await filledBuild();
    const run = await client.post(`/api/builds/${id}/dyno-runs`, dynoRun('2026-05-01'));
    const runId = run.body.build.dynoRuns[0].id as number;
    const photo = await photoRow(id);
    for (const spelling of [`0x${id.toString(16)}`, `${id}e0`, `%20${id}`, `${id}%20`, `0${id}`, `+${id}`, `${id}.0`]) {
      const res = await client.get(`/api/builds/${spelling}`);
      expect(res.status, spelling).toBe(400);
      expect(res.body.error.fields.id).toBeDefined();
    }
    for (const spelling of [`0x${runId.toString(16)}`, `${runId}e0`, `${runId}%20`]) {
      const res = await client.delete(`/api/builds/${id}/dyno-runs/${spelling}`);
      expect(res.status, spelling).toBe(400);
      expect(res.body.error.fields.recordId).toBeDefined();
      const patch = await client.patch(`/api/builds/${id}/photos/${spelling.replace(String(runId), String(photo.id))}`, { caption: 'x' });
      expect(patch.status).toBe(400);
      expect(patch.body.error.fields.photoId).toBeDefined();
    }
    expect(await DynoRun.count({ where: { id: runId } })).toBe(1);
  });
});

describe('changing the password is rate limited', () => {
  it(`refuses attempt ${PASSWORD_CHANGE_LIMIT.limit + 1} in the window, even with the right password`, async () => {
    const { client, password } = await owner();
    for (let i = 0; i < PASSWORD_CHANGE_LIMIT.limit; i++) {
      const res = await client.post('/api/account/password', { currentPassword: `wrong guess ${i}`, newPassword: 'a brand new passphrase' });
      expect(res.status, JSON.stringify(res.body)).toBe(400);
    }
    const refused = await client.post('/api/account/password', { currentPassword: password, newPassword: 'a brand new passphrase' });
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe('RATE_LIMITED');
  });
});
