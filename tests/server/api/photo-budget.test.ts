import { afterEach, describe, expect, it, vi } from 'vitest';
import sharp from 'sharp';
import { config } from '@server/config';
import { Photo } from '@server/models/photo';
import { Slots, imageSlots } from '@server/services/media/image-budget';
import { apiClient, type ApiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createBuild } from '../../support/build-factory';

// Image work is bounded per request, per person and per process, so one person's uploads cannot
// take the server from everyone else (npm run bench measures what a visitor sees meanwhile).

const saved = { request: config.photoRequestMegapixels, person: config.photoMegapixelsPerWindow };
afterEach(() => {
  config.photoRequestMegapixels = saved.request;
  config.photoMegapixelsPerWindow = saved.person;
});

/** An 800 × 800 photo: 0.64 megapixels. */
const photo = () => sharp({ create: { width: 800, height: 800, channels: 3, background: '#7a5c3e' } }).jpeg().toBuffer();

async function ownerWithBuild(): Promise<{ client: ApiClient; buildId: number }> {
  const { user, email, password } = await createUser();
  const client = await apiClient();
  expect((await client.signIn(email, password)).status).toBe(200);
  return { client, buildId: (await createBuild(user.id)).id };
}

const upload = async (client: ApiClient, buildId: number, count: number) => {
  let req = client.raw.post(`/api/builds/${buildId}/photos`).set('X-CSRF-Token', client.csrf);
  for (let i = 0; i < count; i++) req = req.attach('photos', await photo(), `p${i}.jpg`);
  return req;
};

describe('photo upload bounds', () => {
  it('refuses one request whose photos hold more pixels together than the per-request budget, storing nothing', async () => {
    config.photoRequestMegapixels = 1;
    const { client, buildId } = await ownerWithBuild();
    const two = await upload(client, buildId, 2);
    expect(two.status).toBe(400);
    expect(two.body.error.fields.photos).toMatch(/1\.3 megapixels together; one upload may hold at most 1\b/);
    expect(await Photo.count({ where: { buildId } })).toBe(0);
    expect((await upload(client, buildId, 1)).status).toBe(201);
  });

  it('refuses a person past their pixel budget for the window with 429, and a refused upload spends nothing', async () => {
    config.photoMegapixelsPerWindow = 2;
    const { client, buildId } = await ownerWithBuild();
    for (let i = 0; i < 3; i++) expect((await upload(client, buildId, 1)).status).toBe(201); // 3 × 0.64 = 1.92
    const over = await upload(client, buildId, 1);
    expect(over.status).toBe(429);
    expect(over.body.error.code).toBe('RATE_LIMITED');
    expect(over.body.error.message).toMatch(/more than 2 megapixels/);
    expect(await Photo.count({ where: { buildId } })).toBe(3);
    // Another person is not affected.
    const other = await ownerWithBuild();
    expect((await upload(other.client, other.buildId, 1)).status).toBe(201);
  });

  it('processes at most IMAGE_CONCURRENCY images at once in this process, however many uploads arrive', async () => {
    const owners = await Promise.all([ownerWithBuild(), ownerWithBuild(), ownerWithBuild()]);
    imageSlots.peak = 0;
    const results = await Promise.all(owners.map(({ client, buildId }) => upload(client, buildId, 2)));
    expect(results.map((r) => r.status)).toEqual([201, 201, 201]);
    expect(imageSlots.peak).toBe(config.imageConcurrency);
  });
});

describe('Slots', () => {
  it('starts a task only when a slot is free, in arrival order', async () => {
    const slots = new Slots(1);
    const started: number[] = [];
    const release: (() => void)[] = [];
    const task = (n: number) => () => new Promise<void>((resolve) => (started.push(n), release.push(resolve)));
    const all = Promise.all([1, 2, 3].map((n) => slots.run(task(n))));
    await vi.waitFor(() => expect(started).toEqual([1]));
    release.shift()!();
    await vi.waitFor(() => expect(started).toEqual([1, 2]));
    release.shift()!();
    await vi.waitFor(() => expect(started).toEqual([1, 2, 3]));
    release.shift()!();
    await all;
    expect(slots.peak).toBe(1);
  });
});
