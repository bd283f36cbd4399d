import { describe, expect, it } from 'vitest';
import { entryKeys, showKeys } from '@client/features/shows/api/show-keys';
import { showDayKeys } from '@client/features/show-day/api/show-day-keys';
import { judgingKeys } from '@client/features/judging/api/judging-keys';
import { resultsKeys } from '@client/features/results/api/results-keys';

// Two queries under one key share one cached answer: if their shapes differ, the second screen reads
// the first one's shape and breaks (a show page and the gate once did). Every key of the show side is
// made by a feature's key factory; here each endpoint's key, for the same show or entry, is its own.
const ID = 7;
const endpointKeys: Record<string, readonly unknown[]> = {
  'GET /api/events?mine': showKeys.mine(),
  'GET /api/events?open': showKeys.open(),
  'GET /api/public/events/:slug': showKeys.public('meet'),
  'GET /api/events/:id': showKeys.detail(ID),
  'GET /api/events/:id/people': showKeys.people(ID),
  'GET /api/events/:id/peoples-choice': showKeys.peoplesChoice(ID),
  'GET /api/invitations/:token': showKeys.invitation('t'),
  'GET /api/entries': entryKeys.mine(),
  'GET /api/events/:id/gate/counts': showDayKeys.gateCounts(ID),
  'GET /api/events/:id/entry-table': showDayKeys.entryTable(ID, { page: 1 }),
  'GET /api/events/:id/card-prints/latest': showDayKeys.cardPrint(ID, null),
  'GET /api/entries/:id/audit': showDayKeys.entryAudit(ID),
  'GET /api/judging': judgingKeys.myShows(),
  'GET /api/events/:id/judging/mine': judgingKeys.mine(ID),
  'GET /api/events/:id/judging/progress': judgingKeys.progress(ID),
  'GET /api/events/:id/judges': judgingKeys.judges(ID),
  'GET /api/events/:id/results/review': resultsKeys.review(ID),
  'GET /api/events/:id/results/rules': resultsKeys.rules(ID),
  'GET /api/events/:id/awards': resultsKeys.awards(ID),
  'GET /api/entries/:id/results': resultsKeys.ownResults(ID),
};

describe('query keys of the show side', () => {
  it('are one per endpoint: no two answers share a cache entry', () => {
    const seen = new Map<string, string>();
    for (const [endpoint, key] of Object.entries(endpointKeys)) {
      const text = JSON.stringify(key);
      expect(seen.get(text), `${endpoint} and ${seen.get(text)} share ${text}`).toBeUndefined();
      seen.set(text, endpoint);
    }
  });

  it('hang a show’s screens under the show’s key, so refreshing the show refreshes them', () => {
    const under = (key: readonly unknown[], prefix: readonly unknown[]) => JSON.stringify(key.slice(0, prefix.length)) === JSON.stringify(prefix);
    for (const key of [showKeys.people(ID), showKeys.peoplesChoice(ID), showDayKeys.gateCounts(ID), showDayKeys.entryTable(ID, {}), showDayKeys.cardPrint(ID, 3)]) {
      expect(under(key, showKeys.detail(ID)), JSON.stringify(key)).toBe(true);
    }
    expect(under(showDayKeys.entryTable(ID, { page: 2 }), showDayKeys.entryTables(ID))).toBe(true);
    expect(under(showKeys.detail(ID), showKeys.all)).toBe(true);
  });
});

describe('every query of the client', () => {
  it('keeps a key of its own: no two query-options functions of any feature make the same key', async () => {
    const files = import.meta.glob('../../client/src/features/*/api/*.ts');
    const makers: Array<[string, (...args: unknown[]) => { queryKey: readonly unknown[] }]> = [];
    for (const [file, load] of Object.entries(files)) {
      for (const [name, value] of Object.entries((await load()) as Record<string, unknown>)) {
        if (name.endsWith('QueryOptions') && typeof value === 'function') makers.push([`${file.replace(/.*features\//, '')} ${name}`, value as never]);
      }
    }
    expect(makers.length).toBeGreaterThan(20);
    const seen = new Map<string, string>();
    for (const [where, make] of makers) {
      // The same id for every parameter: two endpoints of one show must still differ.
      const text = JSON.stringify(make(ID, null).queryKey);
      expect(seen.get(text), `${where} and ${seen.get(text)} share ${text}`).toBeUndefined();
      seen.set(text, where);
    }
  });
});

describe('the show side’s api files', () => {
  const sources = import.meta.glob('../../client/src/features/{shows,show-day,judging,results}/**/*.{ts,tsx}', { query: '?raw', import: 'default', eager: true }) as Record<string, string>;
  const apiFiles = Object.entries(sources).filter(([file]) => /\/api\/[^/]+\.ts$/.test(file));

  it('hold one endpoint each: at most one hook and one query-options function per file', () => {
    expect(apiFiles.length).toBeGreaterThan(40);
    for (const [file, text] of apiFiles) {
      const hooks = text.match(/export (?:const|function) use[A-Z]\w*/g) ?? [];
      const options = text.match(/export const \w+QueryOptions\b/g) ?? [];
      expect(hooks.length, `${file}: ${hooks.join(', ')}`).toBeLessThanOrEqual(1);
      expect(options.length, `${file}: ${options.join(', ')}`).toBeLessThanOrEqual(1);
    }
  });

  it('type no key inline: every key comes from a feature’s key factory', () => {
    for (const [file, text] of Object.entries(sources)) {
      if (file.endsWith('-keys.ts')) continue;
      expect(text, file).not.toMatch(/queryKey:\s*\[/);
      expect(text, file).not.toMatch(/(?:invalidateQueries|setQueryData|getQueryData|removeQueries|cancelQueries)\(\s*(?:\{\s*queryKey:\s*)?\[/);
    }
  });
});
