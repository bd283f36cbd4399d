// npm run bench: requests per second of the public build page /c/<code> against the same bytes
// served as a static file by the same server process, on loopback only, 10 s per target.
// The parent runs autocannon; a child process runs the server, so the two do not share a thread.
import { fork, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import http from 'node:http';
import type { AddressInfo } from 'node:net';

const DURATION_S = Number(process.env.BENCH_SECONDS ?? 10);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
type Ready = { port: number; code: string; staticPath: string };

async function serve(): Promise<void> {
  Object.assign(process.env, { NODE_ENV: 'test', DB_NAME: 'placard_bench', LOG_LEVEL: 'silent', DEMO_MODE: 'false', API_RATE_LIMIT_PER_MINUTE: '1000000' });
  const { ensureDatabase } = await import('@server/db/cluster');
  await ensureDatabase(undefined, ['placard_bench']);
  await import('@server/models/index');
  const { migrate } = await import('@server/db/migrator');
  await migrate();
  const { createUser } = await import('../support/factories');
  const { createFullBuild } = await import('../support/build-factory');
  const { user } = await createUser({ name: 'Bench Owner' });
  const build = await createFullBuild(user.id);
  const { default: express } = await import('express');
  const { createApp } = await import('@server/app');
  const { renderPublicBuildPage } = await import('@server/pages/public-build-page');
  const { loadPublicBuild } = await import('@server/services/public/public-builds');
  const { presentPublicBuild } = await import('@server/presenters/public-build');

  // The same bytes the page route sends, written to a file and served by express.static.
  const dir = mkdtempSync(path.join(tmpdir(), 'placard-bench-'));
  writeFileSync(path.join(dir, 'page.html'), renderPublicBuildPage(presentPublicBuild((await loadPublicBuild(build.code))!), 'metric'));
  const { renderHomePage } = await import('@server/pages/site-pages');
  const { listRecentPublicBuilds } = await import('@server/services/public/public-builds');
  const { presentPublicBuildTile } = await import('@server/presenters/public-build');
  writeFileSync(path.join(dir, 'home.html'), renderHomePage((await listRecentPublicBuilds(8)).map(presentPublicBuildTile), []));
  // As under npm start: the process hears page changes, so cached pages are trusted until one arrives.
  const { ChannelListener } = await import('@server/db/channel-listener');
  const { pageChangeHandlers } = await import('@server/pages/page-listener');
  const { config } = await import('@server/config');
  await new ChannelListener({ connectionString: config.databaseUrl, ...pageChangeHandlers() }).start();
  const outer = express();
  outer.use('/bench-static', express.static(dir));
  outer.use(createApp());
  const server = http.createServer(outer).listen(0, '127.0.0.1', () => {
    const ready: Ready = { port: (server.address() as AddressInfo).port, code: build.code, staticPath: '/bench-static/page.html' };
    process.send!(ready);
  });
  process.on('disconnect', () => process.exit(0));
}

async function bench(): Promise<void> {
  const { default: autocannon } = await import('autocannon');
  const child: ChildProcess = fork(fileURLToPath(import.meta.url), ['--serve'], { execArgv: ['--import', 'tsx'], stdio: ['ignore', 'inherit', 'inherit', 'ipc'] });
  const ready = await new Promise<Ready>((resolve, reject) => {
    child.once('message', (m) => resolve(m as Ready));
    child.once('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
  });
  const base = `http://127.0.0.1:${ready.port}`;
  const run = (url: string, headers: Record<string, string> = {}, seconds = DURATION_S) =>
    autocannon({ url, connections: CONNECTIONS, duration: seconds, headers: { 'accept-language': 'en-GB', ...headers } });
  const get = (url: string, headers: Record<string, string> = {}) =>
    new Promise<{ bytes: number; status: number }>((resolve, reject) => {
      http.get(url, { headers }, (res) => {
        let bytes = 0;
        res.on('data', (c: Buffer) => (bytes += c.length));
        res.on('end', () => resolve({ bytes, status: res.statusCode ?? 0 }));
      }).on('error', reject);
    });

  try {
    const pageUrl = `${base}/c/${ready.code}?units=metric`;
    const staticUrl = `${base}${ready.staticPath}`;
    const plain = await get(pageUrl);
    const gz = await get(pageUrl, { 'accept-encoding': 'gzip' });
    const br = await get(pageUrl, { 'accept-encoding': 'br' });
    const file = await get(staticUrl);
    if (plain.status !== 200 || file.status !== 200 || plain.bytes !== file.bytes) throw new Error(`page ${plain.status}/${plain.bytes} B and file ${file.status}/${file.bytes} B differ`);

    await run(pageUrl, {}, 2); // warm both paths (JIT, cache, connection pool)
    await run(staticUrl, {}, 2);
    const page = await run(pageUrl);
    const stat = await run(staticUrl);
    const pageBr = await run(pageUrl, { 'accept-encoding': 'br, gzip' });
    const ratio = page.requests.average / stat.requests.average;
    const line = (name: string, r: typeof page) => `${name.padEnd(34)} ${Math.round(r.requests.average).toString().padStart(7)} req/s   p99 ${r.latency.p99} ms   errors ${r.errors + r.non2xx}`;
    const homeUrl = `${base}/`;
    const homeFile = `${base}/bench-static/home.html`;
    await run(homeUrl, {}, 2);
    const home = await run(homeUrl);
    const homeStat = await run(homeFile);
    const homeBr = await run(homeUrl, { 'accept-encoding': 'br, gzip' });
    // Same-run ratios on a shared machine: the load average says how busy it was meanwhile.
    console.log(`\nPlacard public page benchmark: ${CONNECTIONS} connections, ${DURATION_S} s per target, loopback only; load average ${loadavg().map((l) => l.toFixed(2)).join(' ')}`);
    console.log(line(`/c/<code> (identity)`, page));
    console.log(line('same bytes, express.static', stat));
    console.log(line(`/c/<code> (brotli)`, pageBr));
    console.log(`ratio page / static: ${ratio.toFixed(2)} (target ≥ 0.80); p99 ratio ${(page.latency.p99 / Math.max(stat.latency.p99, 1)).toFixed(2)}`);
    console.log(line('/ home (identity)', home));
    console.log(line('same bytes, express.static', homeStat));
    console.log(line('/ home (brotli)', homeBr));
    console.log(`ratio home / static: ${(home.requests.average / homeStat.requests.average).toFixed(2)} (target ≥ 1.0)`);
    console.log(`page size: ${(plain.bytes / 1024).toFixed(1)} KB raw, ${(gz.bytes / 1024).toFixed(1)} KB gzip, ${(br.bytes / 1024).toFixed(1)} KB brotli (target < 30 KB compressed, before images)`);
  } finally {
    child.disconnect();
    child.kill();
  }
}

if (process.argv.includes('--serve')) await serve();
else await bench();
