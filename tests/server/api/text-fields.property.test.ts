import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { z } from 'zod';
import { User } from '@server/models/user';
import { BuildCreateSchema, BuildPrivateSchema, BuildUpdateSchema, CreditsSchema, DynoRunCreateSchema, PhotoUpdateSchema, WeighInCreateSchema } from '@shared/schemas/build';
import { SECTION_KINDS, SECTION_SCHEMAS } from '@shared/schemas/build-sections';
import { AccountUpdateSchema, PasswordResetConfirmSchema, PasswordResetRequestSchema, SignInSchema, SignUpSchema } from '@shared/schemas/user';
import { apiClient, type ApiClient } from '../../support/api-client';
import { createUser, uniqueEmail } from '../../support/factories';
import { smallPng } from '../../support/images';
import { textPaths, withValueAt } from '../../support/zod-text-paths';

// Every text field of every write route, fed arbitrary Unicode with NUL, other control characters
// and lone surrogates mixed in: the answer is never a 5xx, and a 4xx leaves the stored data as it was.
// The fields are read from the shared schemas themselves, so a new text field is covered the day it is added.

// A few runs per field keep the suite quick; PROPERTY_RUNS=100 npm test -- tests/server/api/text-fields.property.test.ts digs deeper.
const RUNS = Number(process.env.PROPERTY_RUNS ?? 4);

const char = (from: number, to: number) => fc.integer({ min: from, max: to }).map((c) => String.fromCharCode(c));
const piece = fc.oneof(
  { weight: 4, arbitrary: fc.string({ unit: 'binary', maxLength: 8 }) },
  { weight: 2, arbitrary: fc.string({ unit: 'grapheme', maxLength: 6 }) },
  { weight: 2, arbitrary: char(0xd800, 0xdfff) }, // half of a surrogate pair
  { weight: 2, arbitrary: char(0x00, 0x1f) }, // C0 controls, NUL included
  { weight: 1, arbitrary: fc.constantFrom('\u007f', '\u0085', '\u009f', '\r\n', '\u2028', '\ufeff', '\ufffe') },
);
const anyText = fc.array(piece, { maxLength: 6 }).map((parts) => parts.join(''));

async function signedIn(): Promise<ApiClient> {
  const { email, password } = await createUser({ name: 'Sam Kettle' });
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return client;
}

type Route = { name: string; method: 'post' | 'put' | 'patch'; path: string; schema: z.ZodType; base?: object };

/** Sends arbitrary text into each field; `snapshot` reads what is stored, compared after every 4xx. */
async function checkRoute(client: ApiClient, route: Route, snapshot: () => Promise<unknown>) {
  const paths = textPaths(route.schema);
  expect(paths.length, `${route.name} has text fields`).toBeGreaterThan(0);
  let known = await snapshot();
  for (const path of paths) {
    await fc.assert(
      fc.asyncProperty(anyText, async (value) => {
        const res = await client.raw[route.method](route.path).set('X-CSRF-Token', client.csrf).send(withValueAt(route.base ?? {}, path, value));
        expect(res.status, `${route.name} ${path.join('.')} = ${JSON.stringify(value)}`).toBeLessThan(500);
        if (res.status >= 400) {
          expect(res.body.error.code).toBeTypeOf('string');
          expect(await snapshot(), `${route.name} ${path.join('.')} changed data on ${res.status}`).toEqual(known);
        } else known = await snapshot();
      }),
      { numRuns: RUNS },
    );
  }
}

const madeBy = { madeBy: { kind: 'shop', name: 'Corner Garage' } };
const sectionBase: Record<string, object> = {
  extra: { ...madeBy, lines: [{ label: 'Horn', value: 'Two-tone' }] },
  chassis: { ...madeBy, tubes: [{ use: 'cage', shape: 'round', outside: { value: 44.5, unit: 'mm', provenance: 'estimated' }, wall: { value: 2.4, unit: 'mm', provenance: 'estimated' } }] },
};
const dynoRun = { date: '2026-05-01', standard: 'SAE J1349', measuredAt: 'wheel', powerUnit: 'hp', torqueUnit: 'lbft', peakPower: 412, peakPowerRpm: 6100, peakTorque: 398, peakTorqueRpm: 4400 };
const weighIn = { date: '2026-05-01', unit: 'kg', leftFront: 350, rightFront: 340, leftRear: 310, rightRear: 320, withDriver: false, fuelLevel: 'half' };

/** A signed-in owner with one build and one photo, and a snapshot of the build as the editor reads it. */
async function ownerWithBuild() {
  const client = await signedIn();
  const id = (await client.post('/api/builds', { title: 'Property coupe' })).body.build.id as number;
  const upload = await client.raw.post(`/api/builds/${id}/photos`).set('X-CSRF-Token', client.csrf).attach('photos', await smallPng(), 'p.png');
  expect(upload.status).toBe(201);
  return { client, id, photoId: upload.body.photos[0].id as number, snapshot: async () => (await client.get(`/api/builds/${id}`)).body.build };
}

const buildRoutes = (id: number, photoId: number): Route[] => [
  ...SECTION_KINDS.map((kind): Route => ({ name: `PUT sections/${kind}`, method: 'put', path: `/api/builds/${id}/sections/${kind}`, schema: SECTION_SCHEMAS[kind], base: sectionBase[kind] ?? madeBy })),
  { name: 'PATCH build', method: 'patch', path: `/api/builds/${id}`, schema: BuildUpdateSchema },
  { name: 'PUT private', method: 'put', path: `/api/builds/${id}/private`, schema: BuildPrivateSchema },
  { name: 'PUT credits', method: 'put', path: `/api/builds/${id}/credits`, schema: CreditsSchema, base: { credits: [{ role: 'paint', name: 'A painter' }] } },
  { name: 'POST dyno run', method: 'post', path: `/api/builds/${id}/dyno-runs`, schema: DynoRunCreateSchema, base: dynoRun },
  { name: 'POST weigh-in', method: 'post', path: `/api/builds/${id}/weigh-ins`, schema: WeighInCreateSchema, base: weighIn },
  { name: 'PATCH photo', method: 'patch', path: `/api/builds/${id}/photos/${photoId}`, schema: PhotoUpdateSchema },
];

describe('arbitrary Unicode in every text field of every write route', () => {
  it.each(buildRoutes(0, 0).map((r) => r.name))('%s', async (name) => {
    const { client, id, photoId, snapshot } = await ownerWithBuild();
    await checkRoute(client, buildRoutes(id, photoId).find((r) => r.name === name)!, snapshot);
  });

  it('POST photos: captions beside the files (multipart, UTF-8 on the wire)', async () => {
    const { client, id, snapshot } = await ownerWithBuild();
    await fc.assert(
      fc.asyncProperty(anyText, async (caption) => {
        const before = await snapshot();
        const res = await client.raw.post(`/api/builds/${id}/photos`).set('X-CSRF-Token', client.csrf).field('captions', caption).attach('photos', await smallPng(), 'p.png');
        expect(res.status, JSON.stringify(caption)).toBeLessThan(500);
        if (res.status >= 400) expect(await snapshot()).toEqual(before);
      }),
      { numRuns: RUNS },
    );
  });

  it('new builds and the account', async () => {
    const client = await signedIn();
    const builds = async () => (await client.get('/api/builds')).body.builds;
    await checkRoute(client, { name: 'POST build', method: 'post', path: '/api/builds', schema: BuildCreateSchema, base: { title: 'A title' } }, builds);
    const me = async () => (await client.get('/api/session')).body.user;
    await checkRoute(client, { name: 'PATCH account', method: 'patch', path: '/api/account', schema: AccountUpdateSchema }, me);
  });

  it('sign-up, sign-in and password reset (no stored text but the account made on success)', async () => {
    const client = await apiClient();
    const routes: [string, z.ZodType, () => object][] = [
      ['/api/users', SignUpSchema, () => ({ email: uniqueEmail('prop'), name: 'Prop Person', password: 'long enough passphrase' })],
      ['/api/session', SignInSchema, () => ({ email: uniqueEmail('prop'), password: 'long enough passphrase' })],
      ['/api/password-resets', PasswordResetRequestSchema, () => ({ email: uniqueEmail('prop') })],
      ['/api/password-resets/confirm', PasswordResetConfirmSchema, () => ({ token: 'A'.repeat(43), password: 'long enough passphrase' })],
    ];
    for (const [path, schema, base] of routes) {
      for (const field of textPaths(schema)) {
        await fc.assert(
          fc.asyncProperty(anyText, async (value) => {
            const body = withValueAt(base(), field, value) as { email?: unknown };
            const res = await client.raw.post(path).set('X-CSRF-Token', client.csrf).send(body);
            expect(res.status, `${path} ${field.join('.')} = ${JSON.stringify(value)}`).toBeLessThan(500);
            if (res.status >= 400 && path === '/api/users' && typeof body.email === 'string') {
              expect(await User.count({ where: { email: body.email.trim().toLowerCase() } })).toBe(0);
            }
            // A sign-up signs the new account in: start the next run anonymous again.
            if (res.status === 201) await client.raw.delete('/api/session').set('X-CSRF-Token', res.body.csrfToken as string);
            await client.refresh();
          }),
          { numRuns: RUNS },
        );
      }
    }
  });
});
