// npm run bench -- morning: issue 23's table, a show morning on this machine. Every row is a ratio
// measured in this run (the machine is shared, so absolute figures move with its load), each the
// median of three short runs taken in turns. Static copies are the very bytes the page route sent,
// compressed as it sent them, served by express-static-gzip in the same server process.
import { buildClientIfStale } from '@server/cli/build-client';
import { startBenchServer, getOnce, BROWSER_HEADERS, type BenchServer } from './lib/bench-server';
import { visit, type Visit } from './lib/load';
import { startMorningStaff, type StaffOrder } from './lib/staff-client';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { launch, measureWeakLink, type WeakTiming } from './lib/weak';
import { appPages, WEAK_RESULTS } from './weak-link';
import { kb, mb, median, ms, printTable, ratio, rate, repeat, rssOf, sleep, type Row } from './lib/report';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 2);
const RUNS = Number(process.env.BENCH_RUNS ?? 3);
const SIZES = [100, 1000, 5000];

/** Page against its static copy, in turns, RUNS times: median rate, median p99 and the median of the per-turn ratios. */
async function againstStatic(server: BenchServer, pagePath: string, connections: number) {
  const snap = await server.snapshot(pagePath);
  await visit(server.base, [pagePath], connections, 1); // warm both (JIT, cache, pools)
  await visit(server.base, [snap.staticPath], connections, 1);
  const pairs = await repeat(RUNS, async () => ({ page: await visit(server.base, [pagePath], connections, SECONDS), file: await visit(server.base, [snap.staticPath], connections, SECONDS) }));
  const m = (pick: (v: Visit) => number, which: 'page' | 'file') => median(pairs.map((p) => pick(p[which])));
  return {
    snap,
    rps: m((v) => v.rps, 'page'),
    staticRps: m((v) => v.rps, 'file'),
    p99: m((v) => v.p99, 'page'),
    staticP99: m((v) => v.p99, 'file'),
    rpsRatio: median(pairs.map((p) => p.page.rps / p.file.rps)),
    p99Ratio: median(pairs.map((p) => p.page.p99 / Math.max(p.file.p99, 1))),
    errors: pairs.reduce((s, p) => s + p.page.errors + p.file.errors, 0),
  };
}

async function oneBar(server: BenchServer): Promise<WeakTiming[]> {
  const browser = await launch();
  try {
    return await measureWeakLink(browser, server.base, appPages(server.scenario).map((p) => ({ ...p, workerScope: undefined })));
  } finally {
    await browser.close();
  }
}

async function main() {
  buildClientIfStale();
  const server = await startBenchServer('placard_bench_morning', { sizes: SIZES, morning: { entries: 400, checkedIn: 150, judges: 10 } });
  const s = server.scenario;
  const show = s.morning!;
  const staff = await startMorningStaff(server);
  const rows: Row[] = [];
  const notes: string[] = [];
  try {
    const showPage = `/e/${show.slug}`;
    const votingPage = `/c/${s.buildCodes[0]}`;
    const visitors = [showPage, votingPage, `/c/${s.buildCodes[1]}`, showPage, `/c/${s.buildCodes[2]}`];

    // Memory first, before other rows' load has grown the heap: idle after one visit of each page, at the
    // end of 10 s of 200 visitors on the show page, and 10 s later.
    for (const p of new Set(visitors)) await getOnce(`${server.base}${p}`, BROWSER_HEADERS);
    const idle = rssOf(server.pid);
    let peak = idle;
    const sampler = setInterval(() => (peak = Math.max(peak, rssOf(server.pid))), 250);
    await visit(server.base, [showPage], 200, 10);
    clearInterval(sampler);
    const after = rssOf(server.pid);
    await sleep(10_000);
    const settled = rssOf(server.pid);
    const rssRow: Row = {
      what: 'server RSS, 10 s of 200 visitors on /e/',
      measured: `idle ${mb(idle)} → peak ${mb(peak)}, ${mb(after)} at the end, ${mb(settled)} 10 s later`,
      goal: '< 350 MB, back to idle (≤ 1.2 × idle)',
      met: peak < 350 * 2 ** 20 && settled <= idle * 1.2,
    };

    // 1. The show page against the same bytes as a static file.
    for (const connections of [50, 200]) {
      const r = await againstStatic(server, showPage, connections);
      rows.push({
        what: `/e/<slug> (${show.entries} entries) vs static, ${connections} conn.`,
        measured: `${ratio(r.rpsRatio)} req/s (${rate(r.rps)} vs ${rate(r.staticRps)}), p99 ${ratio(r.p99Ratio)} (${ms(r.p99)} vs ${ms(r.staticP99)})${r.errors ? `, ${r.errors} errors` : ''}`,
        goal: '≥ 1.0 × req/s, p99 ≤ 1.2 ×',
        met: r.rpsRatio >= 1 && r.p99Ratio <= 1.2 && r.errors === 0,
      });
    }

    // 2. One request of the show page at each size: the first (rendered) and the next ones (cached).
    for (const size of SIZES) {
      const path = `/e/${s.sized[size]!.slug}`;
      const first = await getOnce(`${server.base}${path}`, BROWSER_HEADERS);
      const again = median((await repeat(5, () => getOnce(`${server.base}${path}`, BROWSER_HEADERS))).map((r) => r.ms));
      const plain = await getOnce(`${server.base}${path}`, { ...BROWSER_HEADERS, 'accept-encoding': 'identity' });
      rows.push({
        what: `/e/ at ${size.toLocaleString('en-GB')} entries, one request`,
        measured: `first ${ms(first.ms)}, cached ${ms(again)}; ${kb(first.body.length)} ${first.encoding}, ${kb(plain.body.length)} uncompressed`,
        goal: '< 30 KB compressed first view',
        met: first.status === 200 && first.body.length < 30 * 1024,
      });
    }

    // 3. Home and a build page with people's choice open, against their static copies.
    const home = await againstStatic(server, '/', 50);
    rows.push({ what: 'home / vs static, 50 conn.', measured: `${ratio(home.rpsRatio)} req/s (${rate(home.rps)} vs ${rate(home.staticRps)})${home.errors ? `, ${home.errors} errors` : ''}`, goal: '≥ 1.0 ×', met: home.rpsRatio >= 1 && home.errors === 0 });
    const voting = await againstStatic(server, votingPage, 50);
    rows.push({
      what: "/c/<code>, people's choice open, vs static, 50 conn.",
      measured: `${ratio(voting.rpsRatio)} req/s (${rate(voting.rps)} vs ${rate(voting.staticRps)}), sent ${voting.snap.encoding}${voting.errors ? `, ${voting.errors} errors` : ''}`,
      goal: '≥ 0.9 ×',
      met: voting.rpsRatio >= 0.9 && voting.errors === 0,
    });

    // 4. Judges' score posts and gate look-ups: alone, then under 200 visitors, in turns.
    const underVisitors = async (order: StaffOrder, pick: 'scores' | 'lookups') => {
      const pairs = await repeat(RUNS, async () => {
        const alone = await staff.run(order);
        const [, loaded] = await Promise.all([visit(server.base, visitors, 200, SECONDS), staff.run(order)]);
        return { alone: median(alone[pick].ms), loaded: median(loaded[pick].ms), errors: alone[pick].errors + loaded[pick].errors };
      });
      return { alone: median(pairs.map((p) => p.alone)), loaded: median(pairs.map((p) => p.loaded)), ratio: median(pairs.map((p) => p.loaded / p.alone)), errors: pairs.reduce((t, p) => t + p.errors, 0) };
    };
    const scores = await underVisitors({ seconds: SECONDS, sheetsPerSecond: 0.5, carsPerSecond: 0, checkIn: false }, 'scores');
    rows.push({ what: "judges' score post p50, alone → 200 visitors", measured: `${ms(scores.alone)} → ${ms(scores.loaded)} (${ratio(scores.ratio)})${scores.errors ? `, ${scores.errors} errors` : ''}`, goal: '≤ 2 × alone', met: scores.ratio <= 2 && scores.errors === 0 });
    const lookups = await underVisitors({ seconds: SECONDS, sheetsPerSecond: 0, carsPerSecond: 5, checkIn: false }, 'lookups');
    rows.push({ what: 'gate lookup p50, alone → 200 visitors', measured: `${ms(lookups.alone)} → ${ms(lookups.loaded)} (${ratio(lookups.ratio)})${lookups.errors ? `, ${lookups.errors} errors` : ''}`, goal: '≤ 2 × alone', met: lookups.ratio <= 2 && lookups.errors === 0 });

    rows.push(rssRow);

    // Sign-in, the judge's first load and the gate on one bar: the weak-link bench's pages, cold (its timings
    // when it ran just before in the same `npm run bench`, else measured here).
    const kept = process.env.BENCH_RUN_DIR ? path.join(process.env.BENCH_RUN_DIR, WEAK_RESULTS) : '';
    const weak: WeakTiming[] = kept && existsSync(kept) ? (JSON.parse(readFileSync(kept, 'utf8')) as WeakTiming[]).filter((t) => t.kind === 'signed-in' && !t.warm) : await oneBar(server);
    const [signIn, judge, gate] = weak;
    const secs = (x: number | null | undefined) => (x === null || x === undefined || !Number.isFinite(x) ? '–' : `${(x / 1000).toFixed(2)} s`);
    rows.push({
      what: 'sign-in, judge first load, gate on one bar',
      measured: `first text ${secs(signIn?.fcp)} / ${secs(judge?.fcp)} / ${secs(gate?.fcp)}; gate usable ${secs(gate?.usable)} (first answer ${secs(gate?.answered)})${weak.some((t) => t.error) ? ' (a load failed)' : ''}${kept && existsSync(kept) ? ' (weak-link table)' : ''}`,
      goal: 'first text < 2 s; gate usable < 3 s',
      met: weak.length === 3 && weak.every((t) => !t.error && t.fcp < 2000) && (gate?.usable ?? Infinity) < 3000,
    });
    notes.push(`Ratios are medians of ${RUNS} runs of ${SECONDS} s taken in turns; visitors send a browser's accept-encoding (gzip, deflate, br).`);
    notes.push(`Under 200 visitors the visitors walk the show page and three build pages; ten judges post a sheet each every 2 s, the gate looks up 5 cars a second, from another process.`);
    notes.push('One bar: 400 kbit/s, 400 ms round trip, phone viewport, empty cache (npm run bench -- weak has the full table).');
    printTable('Show morning (issue 23): same-run ratios on this machine', rows, notes);
  } finally {
    staff.stop();
    await server.stop();
  }
}

await main();
process.exit(0);
