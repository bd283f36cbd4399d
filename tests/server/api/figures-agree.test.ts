import { beforeAll, describe, expect, it } from 'vitest';
import { convert, parseUnit } from '@shared/calc';
import type { BuildSummary } from '@shared/schemas/build';
import type { KeyFigure, PublicBuildResponse } from '@shared/schemas/card';
import { DEMO_BUILDS } from '@server/db/demo/builds';
import { findBuild, setPublished } from '@server/services/builds/builds';
import { apiClient } from '../../support/api-client';
import { createUser } from '../../support/factories';
import { createDemoCardBuilds, demoCardBuildsInMemory } from '../../support/demo-card-builds';
import { pdfText } from '../../support/pdf';

const squash = (s: string) => s.replace(/\s+/g, '');

/** A My builds figure in the unit the public JSON gives for the metric side. */
function inUnit(kind: 'power' | 'mass', figure: { value: number; unit: string }, to: string): number {
  const from = parseUnit(kind, figure.unit);
  const target = parseUnit(kind, to);
  if (!from || !target) throw new Error(`unreadable unit ${figure.unit} or ${to}`);
  return convert(kind, figure.value, from as never, target as never);
}

describe('every screen shows the same figures', () => {
  // The demo builds made once, through the services, for both tests.
  let owner: Awaited<ReturnType<typeof createUser>>;
  let made: Awaited<ReturnType<typeof createDemoCardBuilds>>;
  beforeAll(async () => {
    owner = await createUser({ name: 'Figures Owner' });
    made = await createDemoCardBuilds(owner.user);
  });

  it('My builds, the public JSON and the card agree on power and weight for every demo build', async () => {
    const { email, password } = owner;
    expect(made).toHaveLength(DEMO_BUILDS.length);
    for (const m of made) await setPublished(await findBuild(m.id), true);

    const api = await apiClient();
    await api.signIn(email, password);
    const mine = (await api.get('/api/builds').expect(200)).body.builds as BuildSummary[];

    let compared = 0;
    for (const m of made) {
      const row = mine.find((b) => b.id === m.id)!;
      const json = (await api.get(`/api/public/builds/${m.build.code}`).expect(200)).body as PublicBuildResponse;
      const figure = (key: KeyFigure['key']) => json.build.keyFigures.find((f) => f.key === key);
      const pdf = (await api.raw
        .get(`/api/builds/${m.id}/card.pdf?design=data-sheet&units=metric&figures=power,weight`)
        .buffer(true)
        .parse((r, cb) => {
          const chunks: Buffer[] = [];
          r.on('data', (c: Buffer) => chunks.push(c));
          r.on('end', () => cb(null, Buffer.concat(chunks)));
        })
        .expect(200)).body as Buffer;
      const card = squash(await pdfText(pdf));

      for (const [key, kind, mineFigure] of [
        ['power', 'power', row.keyFigures.power],
        ['weight', 'mass', row.keyFigures.weight],
      ] as const) {
        const shown = figure(key);
        // Either all three have the figure or none does.
        expect(Boolean(mineFigure), `${m.name}: ${key} on My builds vs the public JSON`).toBe(Boolean(shown));
        if (!mineFigure || !shown) continue;
        expect(mineFigure.provenance, `${m.name}: ${key} provenance`).toBe(shown.provenance);
        expect(inUnit(kind, mineFigure, shown.metric.unit), `${m.name}: ${key} value`).toBeCloseTo(shown.metric.value, 6);
        // The card prints the public figure's own words ("478 kW").
        expect(card, `${m.name}: ${key} on the card`).toContain(squash(shown.metric.text));
        compared++;
      }
    }
    // Most demo builds have one or both figures: the comparison is not vacuous.
    expect(compared).toBeGreaterThan(DEMO_BUILDS.length / 2);
  });

  it('the card-layout corpus makes the same demo builds in memory as the services make in the database', async () => {
    const stored = made;
    const inMemory = await demoCardBuildsInMemory();
    // What differs by nature: the public code and its address, ids, the photo's storage address, the time.
    const comparable = (d: (typeof stored)[number]) => ({
      name: d.name,
      build: { ...d.build, code: '', url: '', updatedAt: '', ownerName: '', photos: d.build.photos.map((p) => ({ ...p, id: 0, sources: p.sources.map((s) => [s.width, s.height]) })) },
      cover: d.cover && { width: d.cover.width, height: d.cover.height, format: d.cover.format, bytes: d.cover.data.length > 0 },
    });
    expect(inMemory.map(comparable)).toEqual(stored.map(comparable));
    expect(inMemory.filter((d) => d.cover).length).toBeGreaterThan(DEMO_BUILDS.length / 2);
  });
});
