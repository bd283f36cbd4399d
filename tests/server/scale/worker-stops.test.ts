import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import { Build } from '@server/models/build';
import { CardPrint } from '@server/models/card-print';
import { Entry } from '@server/models/entry';
import { Event } from '@server/models/event';
import { randomBuildCode } from '@server/services/builds/build-codes';
import { forkServer, type ForkedServer } from '../../support/forked-server';
import { forkWorker, type ForkedWorker } from '../../support/forked-worker';
import { remoteClient, type RemoteClient } from '../../support/remote-client';
import { showWithClasses } from '../../support/event-factory';
import { createUser, DEFAULT_PASSWORD } from '../../support/factories';

// Job workers that stop, gracefully or not, in the middle of a bulk print. One web process and job
// workers in processes of their own (the real `npm run worker`) share the test database and one storage
// folder. A worker killed with SIGKILL stops beating, and another takes its print over after
// CARD_PRINT_STALE_SECONDS (short here); a worker told to stop with SIGTERM hands its print back at
// once (no grace period here). Either way the other worker finishes it from the cards already drawn,
// and the download route serves nothing until the whole file is stored.

// Small batches: progress is saved (and a beat written) every few cards, and six batches make a print with a middle.
const BATCH = 4;
const CARS = 6 * BATCH;
const root = mkdtempSync(path.join(tmpdir(), 'placard-worker-stops-'));
const env = { STORAGE_DIR: path.join(root, 'store'), CARD_PRINT_STALE_SECONDS: '3', JOB_STOP_GRACE_SECONDS: '0', CARD_RENDER_BATCH: String(BATCH) };
let web: ForkedServer;
let workers: ForkedWorker[] = [];
let third: Promise<ForkedWorker> | undefined;
type Show = Awaited<ReturnType<typeof showOfConfirmedCars>>;
let shows: [Show, Show];

/**
 * A show (made through the API) with CARS paid entries in two classes, numbered 1…CARS; the builds and
 * entries are made straight through the models, as registration is not what this file tests.
 */
async function showOfConfirmedCars(name: string) {
  const show = await showWithClasses({ settings: { name } });
  const { user } = await createUser({ name: 'Fleet Owner' });
  const event = (await Event.findByPk(show.eventId))!;
  const builds = await Build.bulkCreate(Array.from({ length: CARS }, (_, i) => ({ ownerId: user.id, code: randomBuildCode(), title: `${name} car ${i + 1}`, published: true, modelYear: null, bodyOrigin: null, style: null, weight: null, vin: null, plate: null, ownerPhone: null, ownerAddress: null })));
  await Entry.bulkCreate(builds.map((b, i) => ({ eventId: show.eventId, buildId: b.id, classId: show.classIds[i % 2]!, ownerId: user.id, number: i + 1, status: 'confirmed' as const, feeAmount: 0, currency: event.currency, paidAt: new Date() })));
  return show;
}

beforeAll(async () => {
  const [server, w1, w2, s1, s2] = await Promise.all([forkServer(env), forkWorker(env), forkWorker(env), showOfConfirmedCars('Lights Out Meet'), showOfConfirmedCars('Last Orders Meet')]);
  [web, workers, shows] = [server, [w1, w2], [s1, s2]];
}, 120_000);

afterAll(async () => {
  if (process.env.SHOW_CHILD_OUTPUT) for (const w of workers) console.log(`worker ${w.pid}:\n${w.output().slice(-3000)}`);
  const all = [...new Set([...workers, ...(third ? [await third.catch(() => undefined)] : [])])].filter((w) => w !== undefined);
  for (const w of all) if (w.child.exitCode === null && w.child.signalCode === null) w.child.kill('SIGTERM');
  await Promise.all([...all.map((w) => w.exited), web?.stop()]);
  rmSync(root, { recursive: true, force: true });
});

/** Signed in on the web process as the show's organiser. */
async function organiserOf(show: Show): Promise<RemoteClient> {
  const client = remoteClient(web.base);
  expect((await client.signIn(show.organiser.email, DEFAULT_PASSWORD)).status).toBe(200);
  return client;
}

/**
 * The print's row once it is mid-print: running, a batch drawn and cached, and at least three batches to
 * go (so the worker, stopped now, has more to draw: a SIGTERM is heard before its last batch).
 */
async function midPrint(printId: number): Promise<CardPrint> {
  let row: CardPrint | null = null;
  await expect
    .poll(async () => {
      row = await CardPrint.findByPk(printId);
      return row && { status: row.status, done: row.done, total: row.total };
    }, { timeout: 30_000, interval: 20 })
    .toSatisfy((p: { status: string; done: number; total: number } | null) => p !== null && p.status === 'running' && p.done >= BATCH && p.done <= p.total - 3 * BATCH);
  return row!;
}

const workerOf = (row: { heldBy: string | null }) => workers.find((w) => row.heldBy?.endsWith(`:${w.pid}`));

/**
 * Asks for the file every 100 ms until stopped, as an organiser pressing download again and again would;
 * returns every answer: its status, and its page count when it was a PDF.
 */
function downloadsWhilePrinting(client: RemoteClient, show: Show, printId: number) {
  const answers: Array<{ status: number; pages?: number; error?: string }> = [];
  let stop = false;
  const loop = (async () => {
    while (!stop) {
      const res = await client.get(`/api/events/${show.eventId}/card-prints/${printId}/cards.pdf`);
      answers.push({ status: res.status, ...(res.status === 200 ? { pages: (await PDFDocument.load(res.body as Buffer)).getPageCount() } : {}) });
      await new Promise((r) => setTimeout(r, 100));
    }
  })().catch((err: unknown) => {
    answers.push({ status: -1, error: String(err) }); // unreadable: counted as a wrong answer
  });
  return {
    async stop() {
      stop = true;
      await loop;
      return answers;
    },
  };
}

async function printFinished(client: RemoteClient, show: Show, printId: number) {
  let print: { status: string; done: number; total: number; rendered: number; downloadUrl: string | null } | undefined;
  await expect
    .poll(async () => {
      print = ((await client.get(`/api/events/${show.eventId}/card-prints/${printId}`)).body as { print: typeof print }).print;
      return print!.status;
    }, { timeout: 30_000, interval: 100 })
    .toBe('done');
  const file = await client.get(print!.downloadUrl!);
  expect(file.status).toBe(200);
  return { print: print!, pages: (await PDFDocument.load(file.body as Buffer)).getPageCount() };
}

/** The show's organiser starts its bulk print, keeps pressing download, and the print is waited for mid-way. */
async function printStartedAndMidWay(show: Show) {
  const organiser = await organiserOf(show);
  const started = await organiser.post(`/api/events/${show.eventId}/card-prints`, {});
  expect(started.status).toBe(202);
  const printId = (started.body as { print: { id: number } }).print.id;
  const downloads = downloadsWhilePrinting(organiser, show, printId);
  return { organiser, printId, downloads, mid: await midPrint(printId) };
}

describe('job workers that stop in the middle of a bulk print', () => {
  it('a worker killed with SIGKILL: another takes the print over and finishes it, and no partial file is ever served', async () => {
    const show = shows[0];
    const { organiser, printId, downloads, mid } = await printStartedAndMidWay(show);
    const victim = workerOf(mid)!;
    const survivor = workers.find((w) => w !== victim)!;
    expect(victim, `held by ${mid.heldBy}`).toBeDefined();
    victim.child.kill('SIGKILL');
    expect((await victim.exited).signal).toBe('SIGKILL');
    third = forkWorker(env); // for the next test, starting while this one finishes

    const { print, pages } = await printFinished(organiser, show, printId);
    const answers = await downloads.stop();

    // A live worker finished it (the survivor, or on a slow machine the third, started meanwhile), drawing only what the killed one had not cached.
    const finisher = (await CardPrint.findByPk(printId))!.heldBy;
    expect(finisher).not.toMatch(new RegExp(`:${victim.pid}$`));
    const thirdPid = (await third!).pid;
    expect([survivor.pid, thirdPid].map((pid) => `:${pid}`).some((end) => finisher?.endsWith(end)), `finished by ${finisher}`).toBe(true);
    expect(print).toMatchObject({ status: 'done', done: CARS, total: CARS });
    expect(print.rendered).toBeGreaterThan(0);
    expect(print.rendered).toBeLessThanOrEqual(CARS - mid.done);
    // The file is whole: one page per car. Before it was, the route refused: never a 200 with part of it.
    expect(pages).toBe(CARS);
    expect(answers.filter((a) => a.status !== 409 && a.status !== 200)).toEqual([]);
    expect(answers.filter((a) => a.status === 200 && a.pages !== CARS)).toEqual([]);
    expect(answers.some((a) => a.status === 409)).toBe(true);
  });

  it('a worker stopped with SIGTERM: it hands its print back and exits, and another finishes it at once', async () => {
    expect(third, 'the third worker was started by the test before').toBeDefined();
    workers.push(await third!);
    const show = shows[1];
    const { organiser, printId, downloads, mid } = await printStartedAndMidWay(show);
    const stopped = workerOf(mid)!;
    expect(stopped, `held by ${mid.heldBy}`).toBeDefined();
    stopped.child.kill('SIGTERM');
    expect(await stopped.exited).toEqual({ code: 0, signal: null });
    expect(stopped.output()).toMatch(/"handedBack":true[^\n]*the card print in hand is back on the queue/);

    const { print, pages } = await printFinished(organiser, show, printId);
    const answers = await downloads.stop();
    const finisher = (await CardPrint.findByPk(printId))!.heldBy;
    expect(finisher).not.toBe(mid.heldBy);
    expect(workers.filter((w) => w !== stopped && finisher?.endsWith(`:${w.pid}`))).toHaveLength(1);
    expect(print).toMatchObject({ status: 'done', done: CARS, total: CARS });
    expect(print.rendered).toBeLessThanOrEqual(CARS - mid.done);
    expect(pages).toBe(CARS);
    expect(answers.filter((a) => a.status !== 409 && !(a.status === 200 && a.pages === CARS))).toEqual([]);
  });
});
