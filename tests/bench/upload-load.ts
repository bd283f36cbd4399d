// npm run bench -- upload: what heavy photo uploads do to a visitor reading a public page.
// A child process runs the server (tests/support/forked-server.ts) on its own database, another runs
// the uploaders (tests/support/upload-client.ts), so building their bodies never slows this process, which
// measures the visitor's latency on /c/<code> with autocannon, first on an idle server, then while
// signed-in uploaders keep sending photos: the attack from the hardening review (12 images just under
// the per-image pixel limit in one request) and an ordinary busy moment (several owners each sending
// one 24-megapixel photo per request, as the editor does). Loopback only; figures go in README.md.
import { fork } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import sharp from 'sharp';
import { ensureDatabase } from '@server/db/cluster';
import { PHOTO_MAX_BYTES, PHOTO_MAX_FILES } from '@shared/schemas/build';
import { forkServer, type ForkedServer } from '../support/forked-server';
import type { UploadOrder, UploadTally } from '../support/upload-client';

// A plain `npm run bench` (BENCH_ALL) takes shorter phases, so every section fits in a few minutes.
const SECONDS = Number(process.env.BENCH_SECONDS ?? (process.env.BENCH_ALL ? 5 : 10));
const VISITORS = Number(process.env.BENCH_CONNECTIONS ?? 10);
const DATABASE = 'placard_bench_uploads';

type Session = { cookie: string; csrf: string };

async function signIn(server: ForkedServer): Promise<Session> {
  const first = await fetch(`${server.base}/api/session`);
  let cookie = first.headers.get('set-cookie')?.split(';')[0] ?? '';
  const { csrfToken } = (await first.json()) as { csrfToken: string };
  const res = await fetch(`${server.base}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie },
    body: JSON.stringify({ email: server.email, password: server.password }),
  });
  cookie = res.headers.get('set-cookie')?.split(';')[0] ?? cookie;
  return { cookie, csrf: ((await res.json()) as { csrfToken: string }).csrfToken };
}

/** A photo-like JPEG of the given size (gradients with grain, so it decodes like a real picture), under the upload size limit. */
async function photo(width: number, height: number): Promise<Buffer> {
  const tile = await sharp({ create: { width: 64, height: 64, channels: 3, background: '#808080', noise: { type: 'gaussian', mean: 128, sigma: 12 } } }).png().toBuffer();
  for (const quality of [70, 50, 30, 15]) {
    const jpeg = await sharp({ create: { width, height, channels: 3, background: '#6b4a2f' } }).composite([{ input: tile, tile: true, blend: 'soft-light' }]).jpeg({ quality }).toBuffer();
    if (jpeg.length < PHOTO_MAX_BYTES) return jpeg;
  }
  throw new Error(`cannot make a ${width} × ${height} JPEG under ${PHOTO_MAX_BYTES} bytes`);
}

/** Runs the uploaders in a child process (tests/support/upload-client.ts) for as long as the visitor is timed. */
function uploadFor(server: ForkedServer, session: Session, files: string[], parallel: number): Promise<UploadTally> {
  const child = fork(fileURLToPath(new URL('../support/upload-client.ts', import.meta.url)), [], { execArgv: ['--import', 'tsx'], stdio: ['ignore', 'inherit', 'inherit', 'ipc'] });
  const order: UploadOrder = { url: `${server.base}/api/builds/${server.buildId}/photos`, ...session, files, parallel, seconds: SECONDS };
  child.send(order);
  return new Promise((resolve, reject) => {
    child.once('message', (tally) => resolve(tally as UploadTally));
    child.once('exit', (code) => reject(new Error(`the uploaders stopped with ${code}`)));
  });
}

async function main() {
  const { default: autocannon } = await import('autocannon');
  await ensureDatabase(undefined, [DATABASE]);
  // A high upload limit, so the requests reach the image work (the per-request rate limit is not what is measured).
  const server = await forkServer({ DATABASE_URL: process.env.BENCH_DATABASE_URL ?? '', DB_NAME: DATABASE, LOG_LEVEL: 'silent', PHOTO_UPLOADS_PER_WINDOW: '100000' });
  try {
    const page = `${server.base}/c/${server.code}?units=metric`;
    const visit = () => autocannon({ url: page, connections: VISITORS, duration: SECONDS, headers: { 'accept-encoding': 'br' } });
    console.log('Making test photos…');
    const folder = mkdtempSync(path.join(tmpdir(), 'placard-bench-'));
    const save = (name: string, bytes: Buffer) => (writeFileSync(path.join(folder, name), bytes), path.join(folder, name));
    const nearLimit = save('near-limit.jpg', await photo(9_999, 9_999)); // just under the 100-megapixel limit per image
    const ordinary = save('ordinary.jpg', await photo(6_000, 4_000)); // a 24-megapixel camera frame
    await visit(); // warm-up (JIT, page cache, connection pools)

    const line = (name: string, r: Awaited<ReturnType<typeof visit>>, tally?: UploadTally) =>
      `${name.padEnd(44)} p50 ${String(r.latency.p50).padStart(5)} ms   p99 ${String(r.latency.p99).padStart(5)} ms   max ${String(r.latency.max).padStart(5)} ms   ${Math.round(r.requests.average)} req/s` +
      (tally ? `   uploads: ${tally.map(([s, n]) => `${n}× ${s || 'failed'}`).join(', ')}` : '');

    console.log(`\nVisitor latency on /c/<code>: ${VISITORS} connections, ${SECONDS} s each, loopback`);
    console.log(line('idle server', await visit()));

    const session = await signIn(server);
    for (const [name, files, parallel] of [
      [`attack: ${PHOTO_MAX_FILES} × 100 MP in one request, 2 at once`, Array(PHOTO_MAX_FILES).fill(nearLimit), 2],
      ['busy: 4 owners, one 24 MP photo per request', [ordinary], 4],
    ] as const) {
      const [visited, tally] = await Promise.all([visit(), uploadFor(server, session, [...files], parallel)]);
      console.log(line(name, visited, tally));
    }
  } finally {
    await server.stop();
  }
}

await main();
process.exit(0);
