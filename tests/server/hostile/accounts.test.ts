import { afterAll, beforeAll, describe, it } from 'vitest';
import { cpuSecondsSince, hostileSetup, writeRoutesOf } from '../../support/hostile-attack';

// Hostile input on every write route of the accounts group, made from each route's own zod schema
// (tests/support/hostile-attack.ts): never a 5xx, always the error shape naming the field, no row changed.

let hostile: Awaited<ReturnType<typeof hostileSetup>>;
beforeAll(async () => {
  hostile = await hostileSetup();
});
afterAll(async () => {
  console.log(`hostile input, accounts: ${hostile.tally.routes} write routes (${hostile.tally.variants} with their path variants), ${hostile.tally.cases} requests, ${cpuSecondsSince(hostile.cpuAtStart).toFixed(1)} s of CPU in this process`);
  await hostile.close();
});

describe('hostile input: accounts', () => {
  it.each(writeRoutesOf('accounts').map((r) => [r.key, r] as const))('%s', async (_key, route) => {
    await hostile.attack(route);
  });
});
