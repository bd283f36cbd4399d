import { describe, expect, it } from 'vitest';
import { routeFolderProblems, routeShapeProblems } from '../support/route-shape';

// Every route about one show or one entry reads as the same story: parse, load the show or entry for
// this action through loadEventFor/loadEntryFor (server/routes/load-for.ts), which asks the policy,
// then one service or command and a presenter. No route decides access on its own.
describe('show-side routes', () => {
  it('all load their show or entry through loadEventFor/loadEntryFor and decide no access themselves', () => {
    const { files, problems } = routeFolderProblems('server/routes');
    expect(files).toBeGreaterThan(15);
    expect(problems).toEqual([]);
  });

  it('are reported when one loads its show itself or asks a policy on its own', () => {
    const wrong = [
      "showRouter.get('/events/:id/things', async (req, res) => {",
      '  const event = await findEvent(Number(req.params.id));',
      "  authorizeEvent(await actorInEvent(currentUser(req), event.id), 'manage', event);",
      '  res.json({});',
      '});',
      "showRouter.post('/entries/:id/thing', async (req, res) => {",
      "  const { entry } = await loadEntryFor(req, 'manage');",
      '  res.json({ id: entry.id });',
      '});',
    ].join('\n');
    expect(routeShapeProblems('things.ts', wrong)).toEqual([
      'things.ts: GET /events/:id/things does not load through loadEventFor/loadEntryFor',
      "things.ts:3: decides access itself: authorizeEvent(await actorInEvent(currentUser(req), event.id), 'manage', event);",
    ]);
  });
});
