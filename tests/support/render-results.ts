// Renders the results sheet and the certificates of an invented show in Letter and A4, for looking at them:
//   npx tsx tests/support/render-results.ts /tmp/results [--long]
// Each PDF is also drawn to PNGs at 60 dpi with poppler's pdftoppm. --long gives many classes and long titles.
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { PRINT_PAPERS, type ResultsSnapshot, type SnapshotLine } from '@shared/schemas/results';
import { DEFAULT_RESULT_RULES } from '@shared/schemas/judging';
import { renderCertificates, renderResultsSheet } from '@server/services/results/result-pdfs';

const args = process.argv.slice(2);
const out = args.find((a) => !a.startsWith('--')) ?? '/tmp/results';
mkdirSync(out, { recursive: true });
const long = args.includes('--long');

let n = 0;
// Invented owners: some give hometown and club, some only a name.
const owners = [
  { name: 'Dana Okafor', hometown: 'Millbrook', club: 'Valley Night Cruisers' },
  { name: 'Ruth Lindqvist', hometown: null, club: null },
  { name: 'Tomasz Adeyemi', hometown: 'Harrow Creek', club: null },
];
const line = (className: string, classId: number, place: number, title: string, total: number, shared = false, decidedBy = 'score'): SnapshotLine => ({
  entryId: ++n, number: n, title, code: `code${n}`, classId, className, place, shared, total, decidedBy, owner: owners[n % owners.length] ?? null,
});
const classes = [
  { classId: 1, className: 'Early iron (to 1948)', placings: [line('Early iron (to 1948)', 1, 1, '1932 Highboy Roadster', 118.25), line('Early iron (to 1948)', 1, 2, '1936 Three-Window Coupe', 112.5, false, 'tie broken on Paint and bodywork'), line('Early iron (to 1948)', 1, 3, '1930 Rat Rod Coupe', 112.5)] },
  { classId: 2, className: 'Post-war to 1972', placings: [line('Post-war to 1972', 2, 1, '1963 Split-Window Coupe', 121), line('Post-war to 1972', 2, 2, '1949 Fastback Sedan', 109.75, true, 'shared place'), line('Post-war to 1972', 2, 2, '1978 Lowrider Sedan', 109.75, true, 'shared place')] },
];
if (long) {
  for (let c = 3; c < 12; c++) {
    const name = `Long class name number ${c} for trucks, wagons and everything between`;
    classes.push({ classId: c, className: name, placings: [1, 2, 3].map((p) => line(name, c, p, `A very long invented build title that goes on and on, ${c}-${p}`, 130 - p * 3.333)) });
  }
}
const snapshot: ResultsSnapshot = {
  publishedAt: '2026-10-18T16:30:00Z',
  rules: DEFAULT_RESULT_RULES,
  criteria: [],
  classes,
  bestOfShow: [line('Trucks and wagons', 3, 1, '1957 Wagon', 131.5)],
  peoplesChoice: { votes: 23, winners: [{ ...line('Post-war to 1972', 2, 1, '1978 Lowrider Sedan', 23), decidedBy: '23 votes' }] },
  entries: [],
};
const event = { name: 'Quarry Road Spring Show', venueName: 'Old quarry car park', startsAt: new Date('2026-10-18T09:00:00Z'), timeZone: 'Europe/London' };
for (const paper of PRINT_PAPERS) {
  for (const [kind, pdf] of [['sheet', await renderResultsSheet(event, snapshot, paper)], ['certificates', await renderCertificates(event, snapshot, paper)]] as const) {
    const file = path.join(out, `${kind}-${paper}${long ? '-long' : ''}.pdf`);
    writeFileSync(file, pdf);
    execFileSync('pdftoppm', ['-r', '60', '-png', file, file.replace(/\.pdf$/, '')]);
    console.log(path.basename(file), `${Math.round(pdf.length / 1024)} KB`);
  }
}
