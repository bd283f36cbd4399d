import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readdir, rm } from 'node:fs/promises';
import path from 'node:path';
import sharp from 'sharp';
import type request from 'supertest';
import { PHOTO_MAX_FILES, type Photo as PhotoBody } from '@shared/schemas/build';
import { config } from '@server/config';
import { Photo } from '@server/models/photo';
import { deletePhotoFiles, storePhotosForBuild } from '@server/services/media/photos';
import { apiClient, type ApiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';
import * as images from '../../support/images';

type Upload = { buffer: Buffer; name: string };

let gpsJpeg: Buffer;
let png: Buffer;
beforeAll(async () => {
  [gpsJpeg, png] = await Promise.all([images.jpegWithGps(), images.smallPng()]);
});
afterAll(async () => {
  // Tests get their own temporary storage folder (see server/config.ts).
  if (config.env === 'test') await rm(config.storageDir, { recursive: true, force: true });
});

async function signedInOwner() {
  const { user, email, password } = await createUser();
  const client = await apiClient();
  await client.signIn(email, password);
  const build = await createBuild(user.id);
  return { user, client, build };
}

function upload(client: ApiClient, buildId: number, files: Upload[], captions: string[] = [], field = 'photos'): request.Test {
  const req = client.raw.post(`/api/builds/${buildId}/photos`).set('X-CSRF-Token', client.csrf);
  for (const f of files) req.attach(field, f.buffer, f.name);
  for (const c of captions) req.field('captions', c);
  return req;
}

const put = (client: ApiClient, p: string, body: object) => client.raw.put(p).set('X-CSRF-Token', client.csrf).send(body);

/** Every stored file name under photos/ in this run's storage folder. */
async function storedFiles(): Promise<string[]> {
  return readdir(path.join(config.storageDir, 'photos')).catch(() => []);
}
const filesOfPhoto = async (photoId: number) => {
  const { storageKey } = (await Photo.findByPk(photoId))!;
  return (await storedFiles()).filter((f) => f.startsWith(`${storageKey}-`));
};

async function fetchImage(client: ApiClient, url: string) {
  const res = await client.raw.get(url).buffer(true).parse((r, done) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => done(null, Buffer.concat(chunks)));
  });
  return { res, body: res.body as Buffer };
}

describe('uploading photos', () => {
  it('stores a camera JPEG in every width as WebP and JPEG, with no EXIF or GPS left', async () => {
    const { client, build } = await signedInOwner();
    expect(images.exifHasGps((await sharp(gpsJpeg).metadata()).exif)).toBe(true); // the input does carry a position

    const res = await upload(client, build.id, [{ buffer: gpsJpeg, name: 'front.jpg' }], ['Front three-quarter']);
    expect(res.status).toBe(201);
    expect(res.body.photos).toHaveLength(1);
    const [photo] = res.body.photos as PhotoBody[];
    expect(photo).toMatchObject({ caption: 'Front three-quarter', isCover: true, position: 0, width: 1600, height: 960 });
    expect(photo!.sources.map((s) => [s.width, s.height])).toEqual([[480, 288], [960, 576], [1600, 960]]);

    for (const source of photo!.sources) {
      expect(source.webp).toMatch(/^\/media\/photos\/[0-9a-f]{32}-\d+\.webp$/);
      const webp = await fetchImage(client, source.webp);
      expect(webp.res.status).toBe(200);
      expect(webp.res.headers['content-type']).toBe('image/webp');
      expect(webp.res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(await sharp(webp.body).metadata()).toMatchObject({ format: 'webp', width: source.width, height: source.height });

      const jpeg = await fetchImage(client, source.jpeg);
      expect(jpeg.res.status).toBe(200);
      expect(jpeg.res.headers['content-type']).toBe('image/jpeg');
      expect(jpeg.res.headers['x-content-type-options']).toBe('nosniff');
      const meta = await sharp(jpeg.body).metadata();
      expect(meta).toMatchObject({ format: 'jpeg', width: source.width, height: source.height });
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect((await sharp(webp.body).metadata()).exif).toBeUndefined();
    }

    const url = photo!.sources[0]!.jpeg;
    const first = await client.raw.get(url);
    expect((await client.raw.get(url).set('If-None-Match', first.headers.etag as string)).status).toBe(304);
    const head = await client.raw.head(url);
    expect(head.status).toBe(200);
    expect(head.headers['content-length']).toBe(first.headers['content-length']);
  });

  it('takes several files at once, keeps their order, turns sideways photos upright and never enlarges', async () => {
    const { client, build } = await signedInOwner();
    const files = [
      { buffer: await images.sidewaysJpeg(), name: 'engine.jpg' },
      { buffer: png, name: 'badge.png' },
      { buffer: await images.transparentWebp(), name: 'interior.webp' },
      { buffer: await images.smallAvif(), name: 'rear.avif' },
    ];
    const res = await upload(client, build.id, files, ['Engine bay', 'Badge']);
    expect(res.status).toBe(201);
    const photos = res.body.photos as PhotoBody[];
    expect(photos.map((p) => [p.caption, p.position, p.isCover])).toEqual([
      ['Engine bay', 0, true],
      ['Badge', 1, false],
      ['', 2, false],
      ['', 3, false],
    ]);
    // 1600×1000 with orientation 6 is a 1000×1600 portrait: 480 and 960 wide, no 1600.
    expect(photos[0]!.sources.map((s) => [s.width, s.height])).toEqual([[480, 768], [960, 1536]]);
    // Narrower than every standard width: one variant at its own size.
    expect(photos[1]!.sources.map((s) => [s.width, s.height])).toEqual([[300, 200]]);
    expect(photos[2]!.sources.map((s) => s.width)).toEqual([480, 960]);
    expect(photos[3]!.sources.map((s) => s.width)).toEqual([480]);

    const upright = await fetchImage(client, photos[0]!.sources[1]!.jpeg);
    expect(await sharp(upright.body).metadata()).toMatchObject({ width: 960, height: 1536 });
    expect((await sharp(upright.body).metadata()).orientation).toBeUndefined();
    const small = await fetchImage(client, photos[1]!.sources[0]!.webp);
    expect(await sharp(small.body).metadata()).toMatchObject({ width: 300, height: 200 });
  });

  it('adds later uploads after the others and leaves the cover where it was', async () => {
    const { client, build } = await signedInOwner();
    await upload(client, build.id, [{ buffer: png, name: 'one.png' }]).expect(201);
    const res = await upload(client, build.id, [{ buffer: png, name: 'two.png' }, { buffer: png, name: 'three.png' }]);
    expect(res.status).toBe(201);
    expect((res.body.photos as PhotoBody[]).map((p) => [p.position, p.isCover])).toEqual([[0, true], [1, false], [2, false]]);
  });

  it.each([
    ['an SVG named .jpg', images.svgFile(), 'car.jpg', /car\.jpg is not a JPEG, PNG, WebP or AVIF image/],
    ['an HTML file named .jpg', images.htmlFile(), 'photo.jpg', /photo\.jpg is not a JPEG, PNG, WebP or AVIF image/],
    ['a JPEG header over garbage', images.brokenJpeg(), 'broken.jpg', /broken\.jpg could not be read/],
    ['an HEIC file', images.heicHeader(), 'phone.heic', /phone\.heic is a HEIC photo/],
  ])('refuses %s by its bytes and stores nothing, not even the good photo beside it', async (_label, buffer, name, message) => {
    const { client, build } = await signedInOwner();
    const before = await storedFiles();
    const res = await upload(client, build.id, [{ buffer: gpsJpeg, name: 'good.jpg' }, { buffer, name }]);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.fields.photos).toMatch(message);
    expect(await Photo.count({ where: { buildId: build.id } })).toBe(0);
    expect(await storedFiles()).toEqual(before);
  });

  it('refuses a file over the size limit with the limit in MB', async () => {
    const { client, build } = await signedInOwner();
    const big = await images.oversizedPng();
    const before = await storedFiles();
    const res = await upload(client, build.id, [{ buffer: png, name: 'small.png' }, { buffer: big, name: 'huge.png' }]);
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'PAYLOAD_TOO_LARGE', message: 'Each photo must be at most 15 MB.' });
    expect(res.body.error.fields.photos).toMatch(/15 MB/);
    expect(await Photo.count({ where: { buildId: build.id } })).toBe(0);
    expect(await storedFiles()).toEqual(before);
  });

  it('refuses more files than the limit, none at all, a wrong field and bad captions, naming the field', async () => {
    const { client, build } = await signedInOwner();
    const many = Array.from({ length: PHOTO_MAX_FILES + 1 }, (_, i) => ({ buffer: png, name: `p${i}.png` }));
    const tooMany = await upload(client, build.id, many);
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.fields.photos).toBe(`Send at most ${PHOTO_MAX_FILES} photos at a time.`);

    const none = await client.post(`/api/builds/${build.id}/photos`, {});
    expect(none.status).toBe(400);
    expect(none.body.error.fields.photos).toBe('Choose at least one photo.');

    const onlyCaption = await upload(client, build.id, [], ['A caption with no photo']);
    expect(onlyCaption.status).toBe(400);
    expect(onlyCaption.body.error.fields).toHaveProperty('captions');

    const wrongField = await upload(client, build.id, [{ buffer: png, name: 'a.png' }], [], 'image');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error.fields.image).toMatch(/field "photos"/);

    const longCaption = await upload(client, build.id, [{ buffer: png, name: 'a.png' }], ['x'.repeat(301)]);
    expect(longCaption.status).toBe(400);
    expect(longCaption.body.error.fields['captions.0']).toMatch(/at most 300/);
    expect(await Photo.count({ where: { buildId: build.id } })).toBe(0);
  });
});

describe('who may change photos', () => {
  it('answers another owner 404 (as for an unknown build), anonymous 401 and an unknown build or photo 404', async () => {
    const { client, build } = await signedInOwner();
    const { body } = await upload(client, build.id, [{ buffer: png, name: 'a.png' }]).expect(201);
    const photoId = (body.photos as PhotoBody[])[0]!.id;
    const base = `/api/builds/${build.id}/photos`;

    const stranger = (await signedInOwner()).client;
    expect((await upload(stranger, build.id, [{ buffer: png, name: 'b.png' }])).status).toBe(404);
    expect((await stranger.patch(`${base}/${photoId}`, { caption: 'mine now' })).status).toBe(404);
    expect((await put(stranger, `${base}/order`, { photoIds: [photoId] })).status).toBe(404);
    expect((await stranger.delete(`${base}/${photoId}`)).status).toBe(404);

    const anonymous = await apiClient();
    const anon = await upload(anonymous, build.id, [{ buffer: png, name: 'c.png' }]);
    expect(anon.status).toBe(401);
    expect(anon.body.error.code).toBe('UNAUTHENTICATED');
    expect((await anonymous.patch(`${base}/${photoId}`, { caption: 'x' })).status).toBe(401);
    expect((await put(anonymous, `${base}/order`, { photoIds: [photoId] })).status).toBe(401);
    expect((await anonymous.delete(`${base}/${photoId}`)).status).toBe(401);

    expect((await upload(client, 2_000_000_000, [{ buffer: png, name: 'd.png' }])).status).toBe(404);
    expect((await client.patch(`${base}/2000000000`, { caption: 'x' })).status).toBe(404);
    const other = await signedInOwner();
    const { body: otherBody } = await upload(other.client, other.build.id, [{ buffer: png, name: 'e.png' }]).expect(201);
    // A photo of someone else's build is not found under this build.
    expect((await client.delete(`${base}/${(otherBody.photos as PhotoBody[])[0]!.id}`)).status).toBe(404);
    expect((await client.patch(`${base}/abc`, { caption: 'x' })).body.error.fields.photoId).toMatch(/number/);

    expect(await Photo.count({ where: { buildId: build.id } })).toBe(1);
    expect((await Photo.findByPk(photoId))!.caption).toBe('');
  });
});

describe('captions, cover and order', () => {
  async function buildWithThree() {
    const owner = await signedInOwner();
    const { body } = await upload(owner.client, owner.build.id, [png, png, png].map((buffer, i) => ({ buffer, name: `${i}.png` }))).expect(201);
    return { ...owner, ids: (body.photos as PhotoBody[]).map((p) => p.id), base: `/api/builds/${owner.build.id}/photos` };
  }
  const coverIds = async (buildId: number) => (await Photo.findAll({ where: { buildId, isCover: true } })).map((p) => p.id);

  it('changes a caption and moves the one cover', async () => {
    const { client, build, ids, base } = await buildWithThree();
    const captioned = await client.patch(`${base}/${ids[1]}`, { caption: '  Dash at dusk  ' });
    expect(captioned.status).toBe(200);
    expect(captioned.body.photo).toMatchObject({ id: ids[1], caption: 'Dash at dusk', isCover: false });

    const cover = await client.patch(`${base}/${ids[2]}`, { isCover: true });
    expect(cover.status).toBe(200);
    expect(cover.body.photo).toMatchObject({ id: ids[2], isCover: true });
    expect(await coverIds(build.id)).toEqual([ids[2]]);

    const unset = await client.patch(`${base}/${ids[2]}`, { isCover: false });
    expect(unset.status).toBe(400);
    expect(unset.body.error.fields.isCover).toMatch(/true/);
    const long = await client.patch(`${base}/${ids[0]}`, { caption: 'x'.repeat(301) });
    expect(long.status).toBe(400);
    expect(long.body.error.fields.caption).toMatch(/at most 300/);
  });

  it('reorders when given exactly the build’s photo ids', async () => {
    const { client, ids, base } = await buildWithThree();
    const reversed = [...ids].reverse();
    const res = await put(client, `${base}/order`, { photoIds: reversed });
    expect(res.status).toBe(200);
    expect((res.body.photos as PhotoBody[]).map((p) => [p.id, p.position])).toEqual(reversed.map((id, i) => [id, i]));

    for (const photoIds of [ids.slice(0, 2), [...ids, 2_000_000_000], [ids[0], ids[0], ids[1]], [ids[0], ids[1], 2_000_000_000]]) {
      const bad = await put(client, `${base}/order`, { photoIds });
      expect(bad.status).toBe(400);
      expect(bad.body.error.fields).toHaveProperty('photoIds');
    }
    expect((await put(client, `${base}/order`, { photoIds: [] })).body.error.fields.photoIds).toBeDefined();
    expect((await put(client, `${base}/order`, { photoIds: ['x'] })).body.error.fields['photoIds.0']).toBeDefined();
  });

  it('deletes a photo with its files, and the next photo in order becomes cover', async () => {
    const { client, build, ids, base } = await buildWithThree();
    await put(client, `${base}/order`, { photoIds: [ids[0], ids[2], ids[1]] }).expect(200);
    const cover = (await Photo.findByPk(ids[0]))!;
    const coverUrl = `/media/photos/${cover.storageKey}-300.webp`;
    expect((await client.raw.get(coverUrl)).status).toBe(200);

    expect((await client.delete(`${base}/${ids[0]}`)).status).toBe(204);
    expect((await client.raw.get(coverUrl)).status).toBe(404);
    expect((await storedFiles()).filter((f) => f.startsWith(cover.storageKey))).toEqual([]);
    expect(await coverIds(build.id)).toEqual([ids[2]]);
    expect(await filesOfPhoto(ids[1]!)).toHaveLength(2); // the others keep their files
    expect(await filesOfPhoto(ids[2]!)).toHaveLength(2);

    expect((await client.delete(`${base}/${ids[1]}`)).status).toBe(204);
    expect(await coverIds(build.id)).toEqual([ids[2]]);
    expect((await client.delete(`${base}/${ids[2]}`)).status).toBe(204);
    expect(await Photo.count({ where: { buildId: build.id } })).toBe(0);
    expect((await client.delete(`${base}/${ids[2]}`)).status).toBe(404);
  });
});

describe('the media route', () => {
  it('serves only well-formed keys of stored files', async () => {
    const client = await apiClient();
    const unknown = `/media/photos/${'0'.repeat(32)}-480.webp`;
    for (const url of [
      unknown,
      '/media/photos/..%2F..%2Fpackage.json',
      '/media/..%2F..%2F..%2Fetc%2Fpasswd',
      '/media/photos/%2e%2e/%2e%2e/package.json',
      `/media/photos/${'a'.repeat(32)}-480.png`,
      `/media/photos/${'a'.repeat(32)}-480.webp.tmp`,
      '/media/',
    ]) {
      const res = await client.raw.get(url);
      expect(res.status, url).toBe(404);
      expect(res.headers['content-type'], url).toMatch(/json/);
    }
  });
});

describe('the photo services', () => {
  it('stores photos for the demo seeder and deletes their files for a deleted build', async () => {
    const { user } = await createUser();
    const build = await createBuild(user.id);
    const photos = await storePhotosForBuild(build.id, [{ buffer: gpsJpeg, originalName: 'seed.jpg' }, { buffer: png, originalName: 'seed.png' }], ['Seeded']);
    expect(photos.map((p) => [p.caption, p.isCover, p.variants.length])).toEqual([['Seeded', true, 3], ['', false, 1]]);
    const keys = photos.map((p) => p.storageKey);
    const mine = async () => (await storedFiles()).filter((f) => keys.some((k) => f.startsWith(`${k}-`)));
    expect(await mine()).toHaveLength(8);

    await deletePhotoFiles(keys);
    expect(await mine()).toEqual([]);
    await deletePhotoFiles(keys); // already gone: no error
    await deletePhotoFiles(['../../etc/passwd']); // not a storage key: ignored
  });

  it('removes the files it wrote when the rows cannot be saved', async () => {
    const before = await storedFiles();
    await expect(storePhotosForBuild(2_000_000_000, [{ buffer: png, originalName: 'orphan.png' }])).rejects.toMatchObject({ status: 404 });
    expect(await storedFiles()).toEqual(before);
  });
});
