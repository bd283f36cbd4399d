import { describe, expect, it } from 'vitest';
import request from 'supertest';
import type { PublicBuildResponse } from '@shared/schemas/card';
import { apiClient, testApp } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { pdfText } from '../../support/pdf';
import { checkPageVersionOnEveryRequest } from '../../support/page-cache';

checkPageVersionOnEveryRequest();

const est = (value: number, unit: string) => ({ value, unit, provenance: 'estimated' });
// The brake chain of tests/shared/calc/brakes.test.ts: 70.8 % of the torque in front.
const BRAKES = {
  front: { type: 'disc', rotorDiameter: est(330, 'mm'), caliperKind: 'opposed', pistonDiametersMm: [38, 38], padHeightMm: 50, padMu: 0.45 },
  rear: { type: 'disc', rotorDiameter: est(300, 'mm'), caliperKind: 'floating', pistonDiametersMm: [38], padHeightMm: 40, padMu: 0.4 },
  hydraulics: { pedalRatio: 6, masterBoreMm: 22.2, pedalForce: est(400, 'N') },
};
// The worked example of tests/shared/calc/front-geometry.test.ts: roll centre 102 mm up, −0.85° per 25 mm of bump.
const GEOMETRY = { upperInner: { x: 420, y: 440 }, upperOuter: { x: 660, y: 470 }, lowerInner: { x: 300, y: 180 }, lowerOuter: { x: 700, y: 160 }, contactPatchXMm: 760 };
// 1,000 kg, 500 kg an axle, front raised 300 mm on a 2,500 mm wheelbase, wheel centres 300 mm up: the rear
// scales then read 508.12 kg together, so h = 300 + 2500 × 8.12 / (1000 × tan asin(0.12)) = 300 + 20,300 / 120.87 = 468 mm, by hand.
const WEIGH_IN = { date: '2026-05-01', unit: 'kg', leftFront: 250, rightFront: 250, leftRear: 250, rightRear: 250, withDriver: false, fuelLevel: 'full', tilt: { raisedAxle: 'front', raisedHeightMm: 300, wheelCentreHeightMm: 300, leftRaised: 254.06, rightRaised: 254.06 } };

/** The client's answer, after checking its status (the client awaits the request itself). */
function status<R extends { status: number; body: { error?: unknown } }>(res: R, expected: number): R {
  expect(res.status, JSON.stringify(res.body.error ?? null)).toBe(expected);
  return res;
}

async function ownerWithBuild() {
  const { email, password } = await createUser({ name: 'Tamsin Vale' });
  const api = await apiClient();
  await api.signIn(email, password);
  const build = (status(await api.post('/api/builds', { title: 'The Ledger Coupe' }), 201)).body.build as { id: number; code: string };
  status(await api.put(`/api/builds/${build.id}/private`, { vin: 'VIN-ENGINEERING-0001', plate: 'PLATE-ENG-1' }), 200);
  return { api, build };
}

const cardText = async (api: Awaited<ReturnType<typeof apiClient>>, id: number) => {
  const res = await api.raw
    .get(`/api/builds/${id}/card.pdf?design=data-sheet&units=metric&sections=chassis,brakes&figures=weight`)
    .buffer(true)
    .parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    })
    .expect(200);
  return (await pdfText(res.body as Buffer)).replace(/\s+/g, ' ');
};

describe('the worked-out figures an owner chooses to show', () => {
  it('stay off the public page, its JSON and the card until the owner chooses them, then go out in words with the caution', async () => {
    const { api, build } = await ownerWithBuild();
    status(await api.put(`/api/builds/${build.id}/sections/brakes`, BRAKES), 200);
    status(await api.put(`/api/builds/${build.id}/sections/chassis`, { wheelbase: est(2500, 'mm'), front: { type: 'double-wishbone', geometry: GEOMETRY } }), 200);
    const added = status(await api.post(`/api/builds/${build.id}/weigh-ins`, WEIGH_IN), 201);
    // The tilted reading is kept with the weigh-in and comes back to the owner.
    expect(added.body.build.weighIns[0].tilt).toEqual(WEIGH_IN.tilt);
    status(await api.put(`/api/builds/${build.id}/published`, { published: true }), 200);

    const before = (await request(testApp()).get(`/api/public/builds/${build.code}`).expect(200)).body as PublicBuildResponse;
    expect(before.build.engineering).toBeNull();
    const pageBefore = (await request(testApp()).get(`/c/${build.code}?units=metric`).expect(200)).text;
    expect(pageBefore).not.toContain('id="worked-out"');
    expect(await cardText(api, build.id)).not.toMatch(/Brake split/);

    status(await api.put(`/api/builds/${build.id}/sections/brakes`, { ...BRAKES, showFigures: true }), 200);
    status(await api.put(`/api/builds/${build.id}/sections/chassis`, { wheelbase: est(2500, 'mm'), front: { type: 'double-wishbone', geometry: GEOMETRY }, showFigures: true }), 200);

    const json = await request(testApp()).get(`/api/public/builds/${build.code}`).expect(200);
    const engineering = (json.body as PublicBuildResponse).build.engineering!;
    expect(engineering.metric.map((f) => `${f.label}: ${f.value}`)).toEqual([
      'Brake split: 71\u00a0% front / 29\u00a0% rear est.',
      'Front roll-centre height: 102\u00a0mm est.',
      'Front camber gain: −0.85° per 25\u00a0mm of bump est.',
      'Centre-of-gravity height: 468\u00a0mm est.',
    ]);
    expect(engineering.imperial.find((f) => f.key === 'cgHeight')?.value).toBe('18.4\u00a0in est.');
    expect(engineering.caution).toMatch(/^Estimates for presentation, not engineering approval; defer to local regulations/);
    expect(json.text).not.toMatch(/NaN|Infinity|VIN-ENGINEERING|PLATE-ENG/);

    const html = (await request(testApp()).get(`/c/${build.code}?units=metric`).expect(200)).text;
    const worked = html.match(/<section id="worked-out"[\s\S]*?<\/section>/)?.[0] ?? '';
    for (const text of ['Worked out', 'Brake split', '71\u00a0% front / 29\u00a0% rear est.', 'Front roll-centre height', '102\u00a0mm est.', '−0.85° per 25\u00a0mm of bump est.', '468\u00a0mm est.']) expect(worked).toContain(text);
    // The caution beside the figures, and the two sketches they come from.
    expect(worked).toMatch(/<p class="care">Estimates for presentation, not engineering approval/);
    expect(worked).toContain('data-testid="brake-split-bar"');
    // A sketch the browser can draw: a plain-number viewBox (no thousands separators).
    expect(worked).toMatch(/<svg viewBox="0 0 \d+ \d+" role="img" aria-label="Front view of the front suspension: instant centre and roll centre at 102 mm" data-testid="front-view-sketch"/);
    expect(html).not.toMatch(/VIN-ENGINEERING|PLATE-ENG|NaN|Infinity/);
    // Read in inches, the camber gain is per inch (1 in = 25.4 mm) and the sketch labels the roll centre in inches too.
    const inches = (await request(testApp()).get(`/c/${build.code}?units=imperial`).expect(200)).text.match(/<section id="worked-out"[\s\S]*?<\/section>/)?.[0] ?? '';
    expect(inches).toContain('−0.86° per inch of bump est.');
    expect(inches).toMatch(/>RC 4\.0 in<\/text>/);
    expect(inches).not.toMatch(/\bmm\b/);

    const card = await cardText(api, build.id);
    expect(card).toContain('WORKED OUT (ESTIMATES)');
    // Full stops compared loosely: in a full run pdf.js, shared with other files in this process, now and then reads a card's "." as nothing.
    const loose = (s: string) => s.replace(/\./g, '');
    for (const text of ['Brake split 71 % front / 29 % rear est.', 'Front roll-centre height 102 mm est.', 'Centre-of-gravity height 468 mm est.', 'Estimates for presentation, not engineering approval']) expect(loose(card)).toContain(loose(text));
    expect(card).not.toMatch(/VIN-ENGINEERING|PLATE-ENG/);
  });

  it('parallel arms: an infinite swing arm said in words, never NaN or Infinity in the page or the JSON', async () => {
    const { api, build } = await ownerWithBuild();
    const parallel = { upperInner: { x: 420, y: 450 }, upperOuter: { x: 660, y: 450 }, lowerInner: { x: 300, y: 180 }, lowerOuter: { x: 700, y: 180 }, contactPatchXMm: 760 };
    status(await api.put(`/api/builds/${build.id}/sections/chassis`, { front: { geometry: parallel }, showFigures: true }), 200);
    status(await api.put(`/api/builds/${build.id}/published`, { published: true }), 200);
    const json = await request(testApp()).get(`/api/public/builds/${build.code}`).expect(200);
    // Level parallel arms put the roll centre on the ground; their unequal lengths (240 and 400 mm) still tip the wheel a little.
    expect((json.body as PublicBuildResponse).build.engineering!.metric.map((f) => f.value)).toEqual(['0\u00a0mm est.', '−0.11° per 25\u00a0mm of bump est.']);
    expect(json.text).not.toMatch(/NaN|Infinity/);
    expect((await request(testApp()).get(`/c/${build.code}`).expect(200)).text).not.toMatch(/NaN|Infinity/);
  });
});

describe('bad brake, geometry and tilt input is refused naming the field', () => {
  it('a pad taller than the rotor radius, a piston of zero, and too many pistons a side', async () => {
    const { api, build } = await ownerWithBuild();
    const pad = status(await api.put(`/api/builds/${build.id}/sections/brakes`, { ...BRAKES, front: { ...BRAKES.front, rotorDiameter: est(200, 'mm'), padHeightMm: 100 } }), 400);
    expect(pad.body.error.fields).toEqual({ 'front.padHeightMm': 'Front pad radial height must be less than the rotor’s radius (100.0 mm, half its diameter).' });
    // The rotor in inches: 7 in is 177.8 mm, an 88.9 mm radius.
    const inches = status(await api.put(`/api/builds/${build.id}/sections/brakes`, { rear: { rotorDiameter: est(7, 'in'), padHeightMm: 90 } }), 400);
    expect(inches.body.error.fields).toEqual({ 'rear.padHeightMm': 'Rear pad radial height must be less than the rotor’s radius (88.9 mm, half its diameter).' });
    const zero = status(await api.put(`/api/builds/${build.id}/sections/brakes`, { ...BRAKES, front: { ...BRAKES.front, pistonDiametersMm: [38, 0] } }), 400);
    expect(zero.body.error.fields).toEqual({ 'front.pistonDiametersMm.1': 'Front caliper piston diameter must be between 10 and 90 mm.' });
    const many = status(await api.put(`/api/builds/${build.id}/sections/brakes`, { rear: { pistonDiametersMm: [30, 32, 34, 36] } }), 400);
    expect(many.body.error.fields).toEqual({ 'rear.pistonDiametersMm': 'At most 3 rear pistons per side.' });
    const negative = status(await api.put(`/api/builds/${build.id}/sections/brakes`, { hydraulics: { masterBoreMm: -22 } }), 400);
    expect(negative.body.error.fields).toEqual({ 'hydraulics.masterBoreMm': 'Master cylinder bore must be between 10 and 50 mm.' });
  });

  it('a tilted reading with more on two scales than the whole car, or a rise out of range', async () => {
    const { api, build } = await ownerWithBuild();
    const heavy = status(await api.post(`/api/builds/${build.id}/weigh-ins`, { ...WEIGH_IN, tilt: { ...WEIGH_IN.tilt, leftRaised: 900, rightRaised: 900 } }), 400);
    expect(heavy.body.error.fields).toEqual({ 'tilt.leftRaised': 'The two scales under the rear axle cannot read more together than the whole car (1000 kg).' });
    const high = status(await api.post(`/api/builds/${build.id}/weigh-ins`, { ...WEIGH_IN, tilt: { ...WEIGH_IN.tilt, raisedHeightMm: 4000 } }), 400);
    expect(high.body.error.fields).toEqual({ 'tilt.raisedHeightMm': 'Height the axle was raised must be between 20 and 1500 mm.' });
    const noAxle = status(await api.post(`/api/builds/${build.id}/weigh-ins`, { ...WEIGH_IN, tilt: { ...WEIGH_IN.tilt, raisedAxle: 'middle' } }), 400);
    expect(noAxle.body.error.fields).toEqual({ 'tilt.raisedAxle': 'Choose which axle was raised.' });
  });
});
