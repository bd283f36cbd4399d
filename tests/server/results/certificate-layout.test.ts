import { describe, expect, it } from 'vitest';
import { DEFAULT_RESULT_RULES } from '@shared/schemas/judging';
import { PRINT_PAPERS, type ResultsSnapshot } from '@shared/schemas/results';
import { TITLE_MAX } from '@shared/schemas/build';
import { CLUB_MAX_LENGTH, HOMETOWN_MAX_LENGTH, NAME_MAX_LENGTH } from '@shared/constants';
import { renderCertificates, renderResultsSheet } from '@server/services/results/result-pdfs';
import { inside, overlaps, readCardLayouts } from '../../support/pdf';

const longest = 'W'.repeat(12) + ' Long-roof custom wagon with a chopped top and a hand-formed aluminium grille and a name that runs on'.padEnd(TITLE_MAX - 12, ' x').slice(0, TITLE_MAX - 12);
const className = 'Pickups, panel vans, wagons and everything with a tailgate (any year)';
// The owner's credit at its longest: name, hometown and club each at the account's limit, in short words.
const owner = { name: 'Maximiliana '.padEnd(NAME_MAX_LENGTH, ' Xu'), hometown: 'Upper '.padEnd(HOMETOWN_MAX_LENGTH, ' Wy'), club: 'Society of '.padEnd(CLUB_MAX_LENGTH, ' Mz') };
const line = (entryId: number, place: number, title: string, shared = false) => ({ entryId, number: 1000 + entryId, title, code: `c${entryId}`, classId: 1, className, place, shared, total: 123.456, decidedBy: 'score', owner });
const snapshot: ResultsSnapshot = {
  publishedAt: '2026-10-18T16:30:00Z',
  rules: DEFAULT_RESULT_RULES,
  criteria: [],
  classes: [{ classId: 1, className, placings: [line(1, 1, longest, true), line(2, 1, 'Short', true)] }],
  bestOfShow: [line(3, 1, longest)],
  peoplesChoice: { votes: 41, winners: [{ ...line(4, 1, longest, true), total: 41, decidedBy: '41 votes' }, { ...line(5, 1, 'Short', true), total: 41, decidedBy: '41 votes' }] },
  entries: [],
};
const event = { name: 'An invented show with a rather long name for its certificates', venueName: 'The far end of the old quarry car park', startsAt: new Date('2026-10-18T09:00:00Z'), timeZone: 'Europe/London' };
const MARGIN = 36;

describe('certificates and the results sheet at their longest', () => {
  for (const paper of PRINT_PAPERS) {
    it(`keep every line inside the margins and apart on ${paper}, with a ${TITLE_MAX}-character title, the longest owner credit and a shared place`, async () => {
      for (const pdf of [await renderCertificates(event, snapshot, paper), await renderResultsSheet(event, snapshot, paper)]) {
        const pages = await readCardLayouts(pdf);
        for (const page of pages) {
          const [, , width, height] = page.mediaBox as [number, number, number, number];
          // The page footer sits a quarter inch from the bottom edge, the least any Placard print allows.
          const safe = { x0: MARGIN, y0: 18, x1: width - MARGIN, y1: height - MARGIN };
          const texts = page.texts.filter((t) => t.str.trim());
          for (const t of texts) expect(inside(t, safe, 0.5), `${t.str} at ${JSON.stringify(t)}`).toBe(true);
          for (const [i, a] of texts.entries()) for (const b of texts.slice(i + 1)) expect(overlaps(a, b, 0.5), `${a.str} / ${b.str}`).toBe(false);
        }
      }
    });
  }
});
