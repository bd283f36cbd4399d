import { describe, expect, it } from 'vitest';
import { testApp } from '../../support/api-client';
import { appRoutes, routeKey } from '../../support/route-table';
import { CALLERS } from './fixture';
import { PEOPLE_FOREIGN, PEOPLE_ROWS } from './rows-people';
import { BUILD_FOREIGN, BUILD_ROWS } from './rows-builds';
import { SHOW_FOREIGN, SHOW_ROWS } from './rows-shows';
import { JUDGING_FOREIGN, JUDGING_ROWS } from './rows-judging';

// The authorization matrix has one row per route the app answers, read from Express's own router:
// a route added without a row (or a row left behind by a route taken away) fails here, by name.
describe('the authorization matrix', () => {
  it('has exactly one row for every route of the router', () => {
    const routes = appRoutes(testApp()).map(routeKey);
    const rows = [...PEOPLE_ROWS, ...BUILD_ROWS, ...SHOW_ROWS, ...JUDGING_ROWS].map((r) => r.route);
    expect(routes.length).toBeGreaterThan(100);
    expect(routes.filter((r) => !rows.includes(r)), 'routes without a row in tests/server/authorization/rows-*.ts').toEqual([]);
    expect(rows.filter((r) => !routes.includes(r)), 'rows naming no route').toEqual([]);
    expect(rows.filter((r, i) => rows.indexOf(r) !== i), 'routes with two rows').toEqual([]);
    const foreign = [...PEOPLE_FOREIGN, ...BUILD_FOREIGN, ...SHOW_FOREIGN, ...JUDGING_FOREIGN];
    expect(foreign.filter((c) => !routes.includes(c.route)), 'foreign-id cells naming no route').toEqual([]);
    console.log(`authorization matrix: ${routes.length} routes × ${CALLERS.length} callers = ${routes.length * CALLERS.length} cells, and ${foreign.length} foreign-id cells`);
  });

  it('reads the routes of a router mounted under a path, and of one mounted bare', async () => {
    const { default: express } = await import('express');
    const app = express();
    const inner = express.Router();
    inner.get('/things/:id', (_req, res) => res.end());
    inner.route('/things').post((_req, res) => res.end()).delete((_req, res) => res.end());
    const outer = express.Router();
    outer.use(inner);
    app.use('/api', outer);
    app.put('/top', (_req, res) => res.end());
    expect(appRoutes(app).map(routeKey)).toEqual(['GET /api/things/:id', 'POST /api/things', 'DELETE /api/things', 'PUT /top']);
  });
});
