import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { brotliDecompressSync } from 'node:zlib';
import { apiClient, testApp } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createFullBuild } from '../../support/build-factory';
import { pdfText } from '../../support/pdf';
import { listenApp, rawGet } from '../../support/raw-http';
import { CARD_DESIGNS } from '@shared/schemas/card';
import { PRIVATE_FIELD_NAMES } from '@shared/schemas/build';
import { Build } from '@server/models/build';
import { BuildSection } from '@server/models/build-section';

let http: Awaited<ReturnType<typeof listenApp>>;
beforeAll(async () => {
  http = await listenApp();
});
afterAll(() => http.close());

// Values no presenter should ever print: if one shows up anywhere public, a field leaked.
const CANARIES = {
  vin: 'CANARYVIN7Q3X9Z2W',
  plate: 'CNRY-PLT-42',
  ownerPhone: '+99 555 0100 7788',
  ownerAddress: '17 Canary Wharf Lane, Nowhere Town',
};

function expectNoCanary(where: string, text: string, email: string) {
  const squashed = text.replace(/\s+/g, '');
  for (const [field, value] of Object.entries({ ...CANARIES, email })) {
    expect(text.includes(value), `${field} leaked into ${where}`).toBe(false);
    expect(squashed.includes(value.replace(/\s+/g, '')), `${field} leaked into ${where} (spaced out)`).toBe(false);
  }
  expect(/canary/i.test(text), `a canary leaked into ${where}`).toBe(false);
}

/** The public page (both unit systems, plain and brotli), the public JSON and every card design's text and bytes. */
async function expectNothingPrivateInPublic(build: Build, email: string, password: string) {
  for (const query of ['', '?units=metric', '?units=imperial']) {
    const page = await request(testApp()).get(`/c/${build.code}${query}`).expect(200);
    expectNoCanary(`/c/${build.code}${query}`, page.text, email);
    const br = await rawGet(`${http.baseUrl}/c/${build.code}${query}`, { 'Accept-Encoding': 'br' });
    expect(br.headers['content-encoding']).toBe('br');
    expectNoCanary(`/c/${build.code}${query} (brotli)`, brotliDecompressSync(br.body).toString(), email);
  }

  const json = await request(testApp()).get(`/api/public/builds/${build.code}`).expect(200);
  expect(json.body.build.title).toBe(build.title); // the JSON is the build's, not an error
  expectNoCanary('/api/public/builds', JSON.stringify(json.body), email);
  for (const key of ['vin', 'plate', 'ownerPhone', 'ownerAddress', 'email', 'ownerId', 'cardSettings']) expect(json.body.build).not.toHaveProperty(key);

  const api = await apiClient();
  await api.signIn(email, password);
  for (const design of CARD_DESIGNS) {
    const res = await api.raw
      .get(`/api/builds/${build.id}/card.pdf?design=${design}&showName=Show&className=Class&entryNumber=12`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    const pdf = res.body as Buffer;
    const text = await pdfText(pdf);
    expect(text).toContain(build.code); // the extraction works: the short URL is there
    expectNoCanary(`the ${design} card`, text, email);
    expectNoCanary(`the ${design} card's bytes`, pdf.toString('latin1'), email);
  }
}

/** Every private field's name as a key holding its canary value: what a stray copy would look like. */
const strayKeys = () => Object.fromEntries(PRIVATE_FIELD_NAMES.map((f) => [f, CANARIES[f]]));

describe('privacy canary', () => {
  it('keeps the VIN, plate, phone, address and e-mail out of the page, the JSON and every card', async () => {
    const email = `canary-owner-${Date.now()}@example.test`;
    const { user, password } = await createUser({ email, name: 'Rowan Teller' });
    const build = await createFullBuild(user.id, CANARIES);
    await expectNothingPrivateInPublic(build, email, password);
  });

  it('sends only the keys the public schemas name: a stray key in a section, a figure, a list row or the weight never leaves', async () => {
    const email = `canary-stray-${Date.now()}@example.test`;
    const { user, password } = await createUser({ email, name: 'Rowan Teller' });
    const build = await createFullBuild(user.id, CANARIES);
    // Written past the schemas, as a bug or an old migration could: straight into the stored JSON.
    const sections = await BuildSection.findAll({ where: { buildId: build.id } });
    expect(sections.map((s) => s.kind).sort()).toEqual(['body', 'brakes', 'chassis', 'drivetrain', 'engine', 'extra', 'wheels']);
    for (const section of sections) {
      const data: Record<string, unknown> = { ...section.data, ...strayKeys(), canaryNote: 'canary stray section key' };
      if (section.kind === 'engine') data.flywheelPower = { ...(data.flywheelPower as object), ...strayKeys() };
      if (section.kind === 'chassis') data.front = { ...(data.front as object), ...strayKeys() };
      if (section.kind === 'extra') data.lines = (data.lines as object[]).map((l) => ({ ...l, ...strayKeys() }));
      if (section.kind === 'engine') data.madeBy = { ...(data.madeBy as object), ...strayKeys() };
      await BuildSection.update({ data }, { where: { id: section.id } });
    }
    await Build.update({ weight: { ...build.weight!, ...strayKeys() } as never, credits: build.credits.map((c) => ({ ...c, ...strayKeys() })) }, { where: { id: build.id } });
    await build.reload();

    await expectNothingPrivateInPublic(build, email, password);
    // The named keys still travel: the allow-list drops strays, not the section.
    const json = await request(testApp()).get(`/api/public/builds/${build.code}`).expect(200);
    expect(json.body.build.sections.engine.flywheelPower).toEqual({ value: 650, unit: 'hp', provenance: 'estimated' });
    expect(json.body.build.sections.chassis.front.type).toBe('double-wishbone');
    expect(json.body.build.weight).toMatchObject({ provenance: expect.any(String) });
  });
});
