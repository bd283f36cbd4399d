// npm run bench -- growth: issue 27's growth table. Shows of 100, 1,000 and 5,000 entries; the public
// show page and the organiser's entries table (its API), each paged, searched and sorted, p50/p99
// with 10 connections. Cost should grow with the page shown, not with the show. The show page's
// paging and search (`?page=`, `?q=`, `?class=`) are being added on another branch: a variant the
// server does not answer differently from the plain page is printed as not there yet, not measured.
import { startBenchServer, getOnce, BROWSER_HEADERS } from './lib/bench-server';
import { visit } from './lib/load';
import { remoteClient } from '../support/remote-client';
import { kb, ms, printTable, ratio, type Row } from './lib/report';

const SIZES = [100, 1000, 5000];
const SECONDS = Number(process.env.BENCH_GROWTH_SECONDS ?? 2);
const CONNECTIONS = 10;

type Variant = { name: string; path: (show: { slug: string; id: number; classIds: number[]; commonWord: string }) => string; api?: boolean; missing?: string };

async function main() {
  const server = await startBenchServer('placard_bench_growth', { sizes: SIZES });
  const s = server.scenario;
  const organiser = remoteClient(server.base);
  if ((await organiser.signIn(s.organiser.email, s.password)).status !== 200) throw new Error('the organiser could not sign in');
  const cookie = { cookie: organiser.state.cookie, accept: 'application/json' };
  const variants: Variant[] = [
    { name: 'show page /e/<slug>', path: (x) => `/e/${x.slug}` },
    { name: 'show page, page 2 (?page=2)', path: (x) => `/e/${x.slug}?page=2`, missing: 'not paged yet' },
    { name: 'show page, searched (?q=)', path: (x) => `/e/${x.slug}?q=${encodeURIComponent(x.commonWord)}`, missing: 'not searched yet' },
    { name: 'show page, one class (?class=)', path: (x) => `/e/${x.slug}?class=${x.classIds[1]}`, missing: 'no class filter yet' },
    { name: 'entries table API, page 2 of 50', path: (x) => `/api/events/${x.id}/entry-table?page=2&pageSize=50`, api: true },
    { name: 'entries table API, searched', path: (x) => `/api/events/${x.id}/entry-table?q=${encodeURIComponent(x.commonWord)}&pageSize=50`, api: true },
    { name: 'entries table API, sorted by title desc.', path: (x) => `/api/events/${x.id}/entry-table?sort=title&dir=desc&page=2&pageSize=50`, api: true },
  ];
  const rows: Row[] = [];
  for (const v of variants) {
    const cells: string[] = [];
    const p50s: number[] = [];
    let missing = false;
    let failed = '';
    for (const size of SIZES) {
      const show = s.sized[size]!;
      const path = v.path(show);
      const headers = v.api ? { ...BROWSER_HEADERS, ...cookie } : BROWSER_HEADERS;
      const first = await getOnce(`${server.base}${path}`, headers);
      if (first.status !== 200) {
        if (v.missing) missing = true;
        else failed = `answered ${first.status}`;
        break;
      }
      if (v.missing) {
        // Not supported yet when the server answers the same page as without the parameter.
        const plain = await getOnce(`${server.base}/e/${show.slug}`, { ...BROWSER_HEADERS, 'accept-encoding': 'identity' });
        const variant = await getOnce(`${server.base}${path}`, { ...BROWSER_HEADERS, 'accept-encoding': 'identity' });
        if (plain.body.equals(variant.body)) {
          missing = true;
          break;
        }
      }
      if (size === SIZES[0]) await visit(server.base, [path], CONNECTIONS, 1, v.api ? cookie : {}); // warm this route (JIT, pools)
      const r = await visit(server.base, [path], CONNECTIONS, SECONDS, v.api ? cookie : {});
      p50s.push(r.p50);
      cells.push(`${size.toLocaleString('en-GB')}: first ${ms(first.ms)}, ${ms(r.p50)} / ${ms(r.p99)}, ${kb(first.body.length)}${r.errors ? `, ${r.errors} errors` : ''}`);
    }
    if (missing) rows.push({ what: v.name, measured: v.missing!, goal: '', met: null });
    else if (failed) rows.push({ what: v.name, measured: failed, goal: '', met: false });
    else {
      const growth = p50s[p50s.length - 1]! / Math.max(p50s[0]!, 0.5);
      rows.push({ what: v.name, measured: `${cells.join(' · ')}; 5,000 / 100: ${ratio(growth)}`, goal: 'p50 at 5,000 ≤ 2 × at 100', met: growth <= 2 });
    }
  }
  printTable(`Growth (issue 27): p50 / p99 and the first answer's size at 100, 1,000 and 5,000 entries, ${CONNECTIONS} connections, ${SECONDS} s each`, rows, [
    'first = the first request (a show page is rendered then, and cached after); sizes are as sent to a browser (compressed for the show page, JSON as sent for the API). The goal is ours: a show 50 times larger costs at most twice as much per request.',
  ]);
  await server.stop();
}

await main();
process.exit(0);
