// npm run bench: the bulk print of numbered cards. 300 confirmed entries drawn from an empty cache
// (targets from the show-day issue: under 15 s and under 500 MB peak memory), the same print again
// with nothing changed (target under 1 s), and again after one car's title changed (one card drawn).
// Runs the job's own function in this process against its own database and a fresh storage folder.
import { mkdtempSync, rmSync } from 'node:fs';
import os, { tmpdir } from 'node:os';
import path from 'node:path';

// A plain `npm run bench` (BENCH_ALL) prints 100 cards, its time target scaled to match, so every section fits in a few minutes.
const CARDS = Number(process.env.BENCH_CARDS ?? (process.env.BENCH_ALL ? 100 : 300));
const TARGET_S = (15 * CARDS) / 300; // 300 cards under 15 s
const storageDir = mkdtempSync(path.join(tmpdir(), 'placard-bench-cards-'));
Object.assign(process.env, { NODE_ENV: 'test', DB_NAME: 'placard_bench_cards', LOG_LEVEL: 'silent', DEMO_MODE: 'false', STORAGE_DIR: storageDir });

const { ensureDatabase } = await import('@server/db/cluster');
await ensureDatabase(undefined, ['placard_bench_cards']);
await import('@server/models/index');
const { migrate } = await import('@server/db/migrator');
await migrate();
const { sequelize } = await import('@server/db/sequelize');
const { Build } = await import('@server/models/build');
const { Entry } = await import('@server/models/entry');
const { CardPrint } = await import('@server/models/card-print');
const { createEvent } = await import('@server/services/shows/events');
const { addClass } = await import('@server/services/shows/event-classes');
const { runCardPrint } = await import('@server/services/show-day/card-prints');
const { createUser } = await import('../support/factories');
const { showSettings } = await import('../support/event-factory');
const { randomBuildCode } = await import('@server/services/builds/build-codes');

// An invented show with four classes and CARDS confirmed entries, made straight through the models.
const { user } = await createUser({ name: 'Bench Organiser', mayOrganise: true });
const show = await createEvent(user, showSettings({ name: 'Bench Valley Rod & Custom Weekend' }) as Parameters<typeof createEvent>[1]);
const classIds: number[] = [];
for (const name of ['Early iron', 'Post-war customs', 'Muscle and restomods', 'Trucks and wagons']) classIds.push((await addClass(show.id, user, { name, description: '', capacity: null })).id);
const bodies = ['roadster', 'coupe', 'fastback', 'sedan', 'pickup', 'wagon', 'hardtop', 'gasser'];
const builds = await Build.bulkCreate(
  Array.from({ length: CARDS }, (_, i) => ({ ownerId: user.id, code: randomBuildCode(), title: `${1928 + (i % 50)} ${bodies[i % bodies.length]} ${i + 1}`, modelYear: null, bodyOrigin: i % 3 ? 'Steel body' : null, style: null, weight: null, vin: null, plate: null, ownerPhone: null, ownerAddress: null, published: true })),
);
await Entry.bulkCreate(builds.map((b, i) => ({ eventId: show.id, buildId: b.id, classId: classIds[i % classIds.length]!, ownerId: user.id, number: i + 1, status: 'confirmed' as const, feeAmount: 2500, currency: 'EUR' })));

/** Runs one print the way the job does; time, peak resident memory while it ran (sampled every 20 ms) and the print's figures. */
async function print(label: string) {
  const row = await CardPrint.create({ eventId: show.id, classId: null, total: CARDS, startedBy: user.id });
  let peak = process.memoryUsage().rss;
  const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  await runCardPrint(row.id);
  const ms = performance.now() - t0;
  const cpu = process.cpuUsage(cpu0);
  clearInterval(sampler);
  peak = Math.max(peak, process.memoryUsage().rss);
  await row.reload();
  if (row.status !== 'done') throw new Error(`${label}: the print ${row.status}: ${row.error}`);
  return { label, ms, cpuMs: (cpu.user + cpu.system) / 1000, peakMb: peak / 2 ** 20, rendered: row.rendered, done: row.done };
}

const cold = await print(`${CARDS} cards, empty cache`);
const warm = await print('the same print again, nothing changed');
await builds[CARDS >> 1]!.update({ title: 'Retitled after the first print' });
const oneEdit = await print('again after one title changed');
const maxRssMb = process.resourceUsage().maxRSS / 1024;

console.log(`\nNumbered cards in bulk (${CARDS} confirmed entries, US Letter, one page each)`);
for (const r of [cold, warm, oneEdit]) {
  console.log(`  ${r.label.padEnd(40)} ${(r.ms / 1000).toFixed(2).padStart(6)} s (CPU ${(r.cpuMs / 1000).toFixed(2).padStart(5)} s)   peak RSS ${r.peakMb.toFixed(0).padStart(4)} MB   drawn ${String(r.rendered).padStart(3)} of ${r.done}`);
}
// Wall time depends on what else the machine runs; the CPU time of this process says what the print costs.
console.log(`  load average while it ran: ${os.loadavg()[0]!.toFixed(1)} on ${os.cpus().length} cores`);
console.log(`  process peak RSS (maxRSS, setup included): ${maxRssMb.toFixed(0)} MB`);
console.log(`  targets: ${CARDS} cards under ${TARGET_S} s: ${cold.ms < TARGET_S * 1000 ? 'met' : 'NOT met'}; under 500 MB: ${cold.peakMb < 500 ? 'met' : 'NOT met'}; unchanged re-print under 1 s: ${warm.ms < 1000 ? 'met' : 'NOT met'}`);

await sequelize.close();
rmSync(storageDir, { recursive: true, force: true });
