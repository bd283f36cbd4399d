import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { EventFieldsSchema, EventUpdateSchema } from '@shared/schemas/show';
import { ClassInputSchema, ClassUpdateSchema, JudgingSheetSchema } from '@shared/schemas/show-classes';
import { MarkPaidSchema } from '@shared/schemas/show-day';
import { ScoreSubmitSchema } from '@shared/schemas/judging';
import { TieBreakCreateSchema } from '@shared/schemas/results';
import type { ApiClient } from '../../support/api-client';
import { showSettings, showWithClasses, ownerWithBuild } from '../../support/event-factory';
import { judgeOf, scoreItem, showInJudging } from '../../support/judging-factory';
import { textPaths, withValueAt } from '../../support/zod-text-paths';

// The show side's text, sent the characters PostgreSQL refuses or garbles: every field answers 400
// naming itself, and nothing is stored. (Which fields use the rule is the schema walk's job:
// tests/shared/schemas/one-text-rule.test.ts; this is the same promise through the real server.)

const BAD: Array<[string, string]> = [
  ['NUL', 'Show\u0000night'],
  ['half of an emoji', 'Show \uD83D night'],
  ['a control character', 'Show\u0007night'],
  ['over-long text', 'x'.repeat(20_000)],
];

type Route = { name: string; method: 'post' | 'put' | 'patch'; path: string; schema: z.ZodType; base: object };

async function refusesBadText(client: ApiClient, route: Route, stored: () => Promise<unknown>) {
  const paths = textPaths(route.schema);
  expect(paths.length, `${route.name} has text fields`).toBeGreaterThan(0);
  const before = await stored();
  for (const path of paths) {
    for (const [what, value] of BAD) {
      const res = await client.raw[route.method](route.path).set('X-CSRF-Token', client.csrf).send(withValueAt(route.base, path, value));
      const label = `${route.name} ${path.join('.')} with ${what}`;
      expect(res.status, label).toBe(400);
      expect(Object.keys(res.body.error.fields ?? {}), label).toContain(path.join('.'));
    }
  }
  expect(await stored(), `${route.name}: nothing stored`).toEqual(before);
}

describe('text the database cannot keep, on the show side', () => {
  it('a new show, its settings, its classes and its judging sheet', async () => {
    const { organiser, eventId, classIds } = await showWithClasses();
    const c = organiser.client;
    const myShows = async () => (await c.get('/api/events')).body.events;
    const show = async () => (await c.get(`/api/events/${eventId}`)).body.event;
    await refusesBadText(c, { name: 'POST /events', method: 'post', path: '/api/events', schema: EventFieldsSchema, base: showSettings() }, myShows);
    await refusesBadText(c, { name: 'PATCH show', method: 'patch', path: `/api/events/${eventId}`, schema: EventUpdateSchema, base: {} }, show);
    await refusesBadText(c, { name: 'POST class', method: 'post', path: `/api/events/${eventId}/classes`, schema: ClassInputSchema, base: { name: 'Customs' } }, show);
    await refusesBadText(c, { name: 'PATCH class', method: 'patch', path: `/api/events/${eventId}/classes/${classIds[0]}`, schema: ClassUpdateSchema, base: {} }, show);
    const sheet = { criteria: [{ name: 'Paint', maxPoints: 10, weight: 1 }] };
    await refusesBadText(c, { name: 'PUT criteria', method: 'put', path: `/api/events/${eventId}/criteria`, schema: JudgingSheetSchema, base: sheet }, show);
  });

  it('a payment note on an entry', async () => {
    const { organiser, eventId, classIds } = await showWithClasses();
    const owner = await ownerWithBuild();
    const entry = (await owner.client.post(`/api/events/${eventId}/entries`, { buildId: owner.build.id, classId: classIds[0] })).body.entry;
    const row = async () => (await organiser.client.get(`/api/events/${eventId}/entry-table`)).body.rows;
    await refusesBadText(organiser.client, { name: 'mark paid', method: 'post', path: `/api/entries/${entry.id}/mark-paid`, schema: MarkPaidSchema, base: { note: 'Cash' } }, row);
  });

  it('a judge’s comments, and the organiser’s reason for ordering a tie', async () => {
    const show = await showInJudging({ carsPerClass: 1 });
    const j = await judgeOf(show.eventId);
    const mine = async () => (await j.client.get(`/api/events/${show.eventId}/judging/mine`)).body;
    const base = { scores: [scoreItem(show.entries[0]!.id, show.criteria[0]!.id, 3)] };
    await refusesBadText(j.client, { name: 'POST scores', method: 'post', path: `/api/events/${show.eventId}/scores`, schema: ScoreSubmitSchema, base }, mine);
    const review = async () => (await show.organiser.client.get(`/api/events/${show.eventId}/results/review`)).body.tieBreaks;
    const tie = { entryIds: show.entries.slice(0, 2).map((e) => e.id), reason: 'Better paint' };
    await refusesBadText(show.organiser.client, { name: 'POST tie-break', method: 'post', path: `/api/events/${show.eventId}/results/tie-breaks`, schema: TieBreakCreateSchema, base: tie }, review);
  });
});
