import { fork, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAKE_S3_CREDENTIALS, startFakeS3, type FakeS3 } from '@server/storage/fake-s3';
import { forkServer, type ForkedServer } from '../../support/forked-server';
import { remoteClient } from '../../support/remote-client';
import { showWithConfirmedEntries } from '../../support/card-print-helpers';
import { DEFAULT_PASSWORD } from '../../support/factories';
import { smallPng } from '../../support/images';

// Placard beyond one process: two web processes on two ports and one job worker, one database and
// one S3 bucket (the fake, on loopback), as behind a load balancer. Whatever one process does, the
// others see: the session, the photos, the bulk print the worker renders, a build's new title.

const root = mkdtempSync(path.join(tmpdir(), 'placard-two-web-'));
let s3: FakeS3;
let a: ForkedServer;
let b: ForkedServer;
let worker: ChildProcess;
let workerOutput = '';

async function forkWorker(env: Record<string, string>): Promise<ChildProcess> {
  const child = fork(path.resolve('server/cli/worker.ts'), [], { execArgv: ['--import', 'tsx'], env: { ...process.env, NODE_ENV: 'test', DEMO_MODE: 'false', LOG_LEVEL: 'warn', ...env }, stdio: ['ignore', 'pipe', 'pipe', 'ipc'] });
  await new Promise<void>((resolve, reject) => {
    const seen = (c: Buffer) => {
      workerOutput += c.toString();
      if (workerOutput.includes('is working the queue')) resolve();
    };
    child.stdout!.on('data', seen);
    child.stderr!.on('data', (c: Buffer) => (workerOutput += c.toString()));
    child.once('exit', (code) => reject(new Error(`the worker exited with ${code}:\n${workerOutput}`)));
  });
  return child;
}

beforeAll(async () => {
  s3 = await startFakeS3({ port: 0, directory: path.join(root, 's3'), bucket: 'placard-two-web' });
  // The server's own TypeScript settings (JSX for the pages), as npm test and npm start give them.
  const shared = { TSX_TSCONFIG_PATH: 'server/tsconfig.runtime.json', STORAGE_DRIVER: 's3', S3_ENDPOINT: s3.endpoint, S3_BUCKET: 'placard-two-web', S3_ACCESS_KEY_ID: FAKE_S3_CREDENTIALS.accessKeyId, S3_SECRET_ACCESS_KEY: FAKE_S3_CREDENTIALS.secretAccessKey };
  [a, b] = await Promise.all([forkServer(shared), forkServer(shared)]);
  worker = await forkWorker(shared);
}, 180_000);

afterAll(async () => {
  if (process.env.SHOW_CHILD_OUTPUT) console.log(b?.output().slice(-4000), a?.output().slice(-2000), workerOutput.slice(-2000));
  worker?.kill('SIGTERM');
  await Promise.all([a?.stop(), b?.stop()]);
  await s3?.close();
  rmSync(root, { recursive: true, force: true });
});

describe('two web processes and a worker on one database and one bucket', () => {
  it('share the session, the photos, the bulk prints and the public pages', async () => {
    // Signed in on A, the same session works on B.
    const onA = remoteClient(a.base);
    expect((await onA.signIn(a.email, a.password)).status).toBe(200);
    const onB = onA.sameSessionOn(b.base);
    expect(((await onB.get('/api/session')).body as { user: { email: string } | null }).user?.email).toBe(a.email);

    // A photo uploaded through A is served by B, from the bucket.
    const form = new FormData();
    form.append('photos', new Blob([new Uint8Array(await smallPng())], { type: 'image/png' }), 'side.png');
    const upload = await onA.post(`/api/builds/${a.buildId}/photos`, form);
    expect(upload.status).toBe(201);
    const src = (upload.body as { photos: Array<{ sources: Array<{ jpeg: string }> }> }).photos[0]!.sources[0]!.jpeg;
    const served = await fetch(`${b.base}${new URL(src, b.base).pathname}`);
    expect([served.status, served.headers.get('content-type')]).toEqual([200, 'image/jpeg']);

    // A build renamed through A: B's public page shows the new title within a second or so.
    expect((await onA.patch(`/api/builds/${a.buildId}`, { title: 'Renamed on the first server' })).status).toBe(200);
    await expect.poll(async () => (await fetch(`${b.base}/c/${a.code}`)).text(), { timeout: 2_000, interval: 100 }).toContain('Renamed on the first server');
  });

  it('render a bulk print started on one process in the worker, and serve the file from the other', async () => {
    const show = await showWithConfirmedEntries([{ title: 'Twin-process roadster', cls: 0 }, { title: 'Second-port coupe', cls: 1 }], { showName: 'Two Port Meet' });
    const organiserOnA = remoteClient(a.base);
    expect((await organiserOnA.signIn(show.organiser.email, DEFAULT_PASSWORD)).status).toBe(200);
    const started = await organiserOnA.post(`/api/events/${show.eventId}/card-prints`, {});
    expect(started.status).toBe(202);
    const printId = (started.body as { print: { id: number } }).print.id;
    const organiserOnB = organiserOnA.sameSessionOn(b.base);
    await expect
      .poll(async () => ((await organiserOnB.get(`/api/events/${show.eventId}/card-prints/${printId}`)).body as { print: { status: string } }).print.status, { timeout: 60_000, interval: 250 })
      .toBe('done');
    const file = await organiserOnB.get(`/api/events/${show.eventId}/card-prints/${printId}/cards.pdf`);
    expect(file.status).toBe(200);
    expect((file.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    expect(workerOutput).not.toMatch(/error/i);
  });
});
