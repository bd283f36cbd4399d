import { describe, expect, it } from 'vitest';
import { testApp } from '../../support/api-client';
import { writeRoutes } from '../../support/write-routes';
import { ROUTE_TARGETS } from '../../support/hostile-routes';

// Every write route the app's router holds has a row in tests/support/hostile-routes.ts (who may call
// it, with which ids), so the hostile-input files send it their junk; a new route without one fails here by name.

describe('hostile input covers every write route', () => {
  const routes = writeRoutes(testApp());

  it.each(routes.map((r) => [r.key]))('%s has a caller and path ids for the hostile-input tests', (key) => {
    expect(ROUTE_TARGETS[key], `${key}: add a row to ROUTE_TARGETS in tests/support/hostile-routes.ts`).toBeDefined();
  });

  it('has no row for a route the router no longer holds', () => {
    const held = new Set(routes.map((r) => r.key));
    expect(Object.keys(ROUTE_TARGETS).filter((key) => !held.has(key))).toEqual([]);
    expect(routes.length).toBeGreaterThan(70);
    console.log(`hostile input: ${routes.length} write routes in the router, each with a row`);
  });
});
