import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { apiClient, testApp } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createFullBuild } from '../../support/build-factory';
import { mediaBoxes, pageCount, readQrPng } from '../../support/pdf';
import { Build } from '@server/models/build';

async function ownerWithBuild() {
  const { user, email, password } = await createUser();
  const build = await createFullBuild(user.id);
  const api = await apiClient();
  await api.signIn(email, password).then((r) => expect(r.status).toBe(200));
  return { user, build, api };
}

const binary = (r: request.Test) => r.buffer(true).parse((res, cb) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
});

describe('card routes', () => {
  it('gives the owner a one-page PDF in the asked design and paper', async () => {
    const { build, api } = await ownerWithBuild();
    const res = await binary(api.raw.get(`/api/builds/${build.id}/card.pdf?design=compact&paper=tabloid&orientation=landscape&sections=engine,brakes&figures=power,weight&units=metric&showName=Riverside%20Autumn%20Run&entryNumber=117`)).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe(`inline; filename="placard-${build.code}-compact-tabloid-landscape.pdf"`);
    const pdf = res.body as Buffer;
    expect(mediaBoxes(pdf)).toEqual([[0, 0, 1224, 792]]);
    expect(pageCount(pdf).objects).toBe(1);
    const download = await binary(api.raw.get(`/api/builds/${build.id}/card.pdf?download=1`)).expect(200);
    expect(download.headers['content-disposition']).toMatch(/^attachment; filename="placard-.+-poster-letter-portrait\.pdf"$/);
  });

  it('refuses other people and anonymous visitors', async () => {
    const { build } = await ownerWithBuild();
    const { email, password } = await createUser();
    const other = await apiClient();
    await other.signIn(email, password);
    for (const path of ['card.pdf', 'qr.png', 'qr.svg', 'card-settings']) {
      await other.get(`/api/builds/${build.id}/${path}`).expect(404);
      await request(testApp()).get(`/api/builds/${build.id}/${path}`).expect(401);
    }
    const put = await other.raw.put(`/api/builds/${build.id}/card-settings`).set('X-CSRF-Token', other.csrf).send({ design: 'compact' });
    expect(put.status).toBe(404);
  });

  it('rejects a bad query naming the field', async () => {
    const { build, api } = await ownerWithBuild();
    const res = await api.get(`/api/builds/${build.id}/card.pdf?design=fancy&paper=legal&sections=engine,roof`).expect(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['design', 'paper', 'sections.1']));
  });

  it('saves the card settings with the build, validated, and prints the next card with them', async () => {
    const { build, api } = await ownerWithBuild();
    const initial = await api.get(`/api/builds/${build.id}/card-settings`).expect(200);
    expect(initial.body).toMatchObject({ saved: false, settings: { design: 'poster', paper: 'letter', orientation: 'portrait', units: 'imperial' }, build: { code: build.code, published: true } });
    expect(initial.body.build.sections).toEqual(['engine', 'drivetrain', 'chassis', 'brakes', 'wheels', 'body', 'extra']);

    const put = (body: object) => api.raw.put(`/api/builds/${build.id}/card-settings`).set('X-CSRF-Token', api.csrf).send(body);
    const bad = await put({ design: 'poster', paper: 'A5', orientation: 'sideways', sections: ['engine', 'roof'], figures: ['speed'], units: 'furlongs' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['figures.0', 'orientation', 'paper', 'sections.1', 'units']);
    expect(bad.body.error.fields.paper).toBe('Paper must be one of letter, a4, tabloid, a3.');

    const settings = { design: 'data-sheet', paper: 'a3', orientation: 'landscape', sections: ['engine', 'wheels'], figures: ['power'], units: 'metric' };
    const ok = await put(settings);
    expect(ok.status).toBe(200);
    expect(ok.body.settings).toEqual(settings);
    expect((await Build.findByPk(build.id))!.cardSettings).toEqual(settings);
    expect((await api.get(`/api/builds/${build.id}/card-settings`).expect(200)).body).toMatchObject({ saved: true, settings });

    const pdf = (await binary(api.raw.get(`/api/builds/${build.id}/card.pdf`)).expect(200)).body as Buffer;
    const [box] = mediaBoxes(pdf);
    expect(box![2]).toBeCloseTo(1190.5512, 2);
    expect(box![3]).toBeCloseTo(841.8898, 2);
  });

  it('hands out the QR code as PNG and SVG for the public URL', async () => {
    const { build, api } = await ownerWithBuild();
    const png = await binary(api.raw.get(`/api/builds/${build.id}/qr.png`)).expect(200);
    expect(png.headers['content-type']).toBe('image/png');
    expect(readQrPng(png.body as Buffer)?.data).toBe(`http://127.0.0.1:3999/c/${build.code}`);
    const svg = await binary(api.raw.get(`/api/builds/${build.id}/qr.svg`)).expect(200);
    expect(svg.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect((svg.body as Buffer).toString()).toMatch(/^<svg /);
  });
});
