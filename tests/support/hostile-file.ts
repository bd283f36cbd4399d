import { afterAll, beforeAll, describe, it } from 'vitest';
import { cpuSecondsSince, hostileSetup, writeRoutesOf } from './hostile-attack';
import type { Group } from './hostile-routes';
import type { Stage } from './hostile-world';

/**
 * One file of hostile input: every write route of `group`, made from each route's own zod schema
 * (hostile-attack.ts): never a 5xx, always the error shape naming the field, no row changed. The
 * groups are files of their own so the api project's workers share them.
 */
export function describeHostileInput(group: Group, stage?: Stage) {
  let hostile: Awaited<ReturnType<typeof hostileSetup>>;
  beforeAll(async () => {
    hostile = await hostileSetup(stage);
  });
  afterAll(async () => {
    console.log(`hostile input, ${group}: ${hostile.tally.routes} write routes (${hostile.tally.variants} with their path variants), ${hostile.tally.cases} requests, ${cpuSecondsSince(hostile.cpuAtStart).toFixed(1)} s of CPU in this process`);
    await hostile.close();
  });
  describe(`hostile input: ${group}`, () => {
    it.each(writeRoutesOf(group).map((r) => [r.key, r] as const))('%s', async (_key, route) => {
      await hostile.attack(route);
    });
  });
}
