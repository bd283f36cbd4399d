// npm run bench -- weak: the pages on one bar of signal (lib/weak.ts: 400 kbit/s, 400 ms round trip,
// a phone's viewport, empty cache), first text and largest paint, and when the app screens are usable.
// Targets (issue 27): public pages text < 1.5 s and largest paint < 2.5 s; signed-in first loads < 3 s;
// under 1 s with the service worker warm.
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { buildClientIfStale } from '@server/cli/build-client';
import { startBenchServer } from './lib/bench-server';
import { measureWeakLink, launch, WEAK_LINK, type WeakPage, type WeakTiming } from './lib/weak';
import { printTable, type Row } from './lib/report';

/** Where a run of `npm run bench` keeps this table's timings for the show-morning table. */
export const WEAK_RESULTS = 'weak-link.json';

const secs = (x: number | null) => (x === null || !Number.isFinite(x) ? '–' : `${(x / 1000).toFixed(2)} s`);

/** The screens a judge and the gate open, and sign-in (shared with the show-morning table's "one bar" row). */
export function appPages(s: Awaited<ReturnType<typeof startBenchServer>>['scenario']): WeakPage[] {
  const who = (email: string) => ({ email, password: s.password });
  const eventId = s.morning!.id;
  return [
    {
      name: 'sign-in /sign-in',
      path: '/sign-in',
      kind: 'signed-in',
      usable: (p) => p.getByLabel('E-mail').waitFor(),
      usableWhen: "[...document.querySelectorAll('label')].some((l) => l.textContent.trim().startsWith('E-mail') && l.control)",
    },
    {
      name: "judge's cars /judge/<id>",
      path: `/judge/${eventId}`,
      kind: 'signed-in',
      as: who(s.judges[0]!.email),
      usable: (p) => p.getByText(/My cars/).first().waitFor(),
      usableWhen: "document.body.textContent.includes('My cars')",
      workerScope: '/judge',
    },
    {
      name: 'gate /gate/<id>',
      path: `/gate/${eventId}`,
      kind: 'signed-in',
      as: who(s.gate.email),
      usable: (p) => p.getByLabel('Entry number').waitFor(),
      usableWhen: "!!document.querySelector('input[aria-label=\"Entry number\"]')",
      // The gate's first look-up, typed and sent the moment the box shows, until the car is on the screen.
      answer: async (p) => {
        await p.getByLabel('Entry number').fill('1');
        await p.getByLabel('Entry number').press('Enter');
        await p.getByRole('region', { name: 'Scanned car' }).getByText('No. 1').waitFor();
      },
    },
  ];
}

export function weakRow(t: WeakTiming): Row {
  const measured = t.error
    ? `failed: ${t.error}`
    : `text ${secs(t.fcp)}, largest paint ${secs(t.lcp)}${t.usable !== null ? `, usable ${secs(t.usable)}` : ''}${t.answered ? `, first answer ${secs(t.answered)}` : ''}`;
  if (t.kind === 'public') return { what: t.name, measured, goal: 'text < 1.5 s, largest paint < 2.5 s', met: !t.error && t.fcp < 1500 && t.lcp < 2500 };
  const done = t.usable ?? t.lcp;
  if (t.warm) return { what: `${t.name}, worker warm`, measured, goal: 'usable < 1 s', met: !t.error && done < 1000 };
  return { what: `${t.name}, first load`, measured, goal: 'usable < 3 s', met: !t.error && done < 3000 };
}

async function main() {
  buildClientIfStale();
  const server = await startBenchServer('placard_bench_weak', { morning: { entries: 60, checkedIn: 30, judges: 1 } });
  const browser = await launch();
  try {
    const s = server.scenario;
    const pages: WeakPage[] = [
      { name: 'home /', path: '/', kind: 'public' },
      { name: 'build page /c/<code>', path: `/c/${s.buildCodes[0]}`, kind: 'public' },
      { name: `show page /e/<slug> (${s.morning!.entries} entries)`, path: `/e/${s.morning!.slug}`, kind: 'public' },
      ...appPages(s),
    ];
    const results = await measureWeakLink(browser, server.base, pages);
    // Within one `npm run bench`, the show-morning table takes its one-bar row from these timings.
    if (process.env.BENCH_RUN_DIR) writeFileSync(path.join(process.env.BENCH_RUN_DIR, WEAK_RESULTS), JSON.stringify(results));
    printTable(`Weak link: Chromium at ${WEAK_LINK.kbitPerSecond} kbit/s, ${WEAK_LINK.rttMs} ms round trip, phone viewport, empty cache`, results.map(weakRow), [
      'first text = first contentful paint; largest paint = the last largest-contentful-paint entry; usable = the screen\'s main control shown (the frame it arrives, read in the page).',
      'Sign-in, the gate and the judge\'s cars are drawn by the server (server/first-screens/) and take input at first paint; first answer = No. 1 typed and sent then, until the gate shows the car (the page looks it up itself; its check-in buttons come with the app).',
      'With the worker warm its own fetch of the page is not slowed (Chromium emulates the network per page, not for the worker): the figure leaves out one round trip.',
    ]);
  } finally {
    await browser.close();
    await server.stop();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await main();
