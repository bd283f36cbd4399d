// Judges and gate staff in a process of their own (so their requests never slow the parent's
// autocannon), signed in through the real API: each judge posts one score sheet (every line of the
// sheet for one car) at a steady pace, as a phone's outbox does, one send after another; the gate
// looks a car up by number and, when asked, checks it in. Reports every request's time and status
// and what each accepted request wrote, so the parent can look for it in the database afterwards.
import { fork, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { fileURLToPath } from 'node:url';
import { remoteClient, type RemoteClient } from '../../support/remote-client';
import type { Scenario } from './bench-server';

export type StaffSetup = { base: string; eventId: number; password: string; judges: string[]; gate: string; judgedEntryIds: number[]; criteria: Array<{ id: number; maxPoints: number }>; expectedNumbers: number[] };
export type StaffOrder = {
  seconds: number;
  /** Sheets each judge posts per second (0: no judging). */
  sheetsPerSecond: number;
  /** Cars the gate handles per second (0: no gate); `checkIn` false only looks them up. */
  carsPerSecond: number;
  checkIn: boolean;
};
export type Stream = { ms: number[]; errors: number; statuses: Record<string, number> };
export type StaffTally = {
  scores: Stream;
  lookups: Stream;
  checkIns: Stream;
  /** Lines of sheets the server answered 200 and applied. */
  posted: Array<{ judgeEmail: string; entryId: number; criterionId: number; points: number }>;
  /** Numbers the server answered 200 to a check-in for. */
  checkedIn: number[];
};

export async function startStaff(setup: StaffSetup): Promise<{ run: (order: StaffOrder) => Promise<StaffTally>; stop: () => void }> {
  const child: ChildProcess = fork(fileURLToPath(import.meta.url), ['--staff'], { execArgv: ['--import', 'tsx'], stdio: ['ignore', 'inherit', 'inherit', 'ipc'] });
  const reply = <T>() =>
    new Promise<T>((resolve, reject) => {
      const onExit = (code: number) => reject(new Error(`the staff client stopped with ${code}`));
      child.once('exit', onExit);
      child.once('message', (m) => {
        child.off('exit', onExit);
        if ((m as { error?: string }).error) reject(new Error((m as { error: string }).error));
        else resolve(m as T);
      });
    });
  child.send({ setup });
  await reply<{ ready: true }>();
  return {
    run: (order) => {
      const r = reply<StaffTally>();
      child.send({ order });
      return r;
    },
    stop: () => child.kill(),
  };
}

// ---- the child ----

const stream = (): Stream => ({ ms: [], errors: 0, statuses: {} });
const sleep = (t: number) => new Promise((r) => setTimeout(r, Math.max(0, t)));

async function timed(s: Stream, call: () => Promise<{ status: number }>): Promise<number> {
  const t0 = performance.now();
  const status = await call().then(
    (r) => r.status,
    () => 0, // no answer
  );
  s.ms.push(performance.now() - t0);
  s.statuses[status] = (s.statuses[status] ?? 0) + 1;
  if (status !== 200) s.errors++;
  return status;
}

async function staffMain(): Promise<void> {
  let setup!: StaffSetup;
  let judges: Array<{ email: string; client: RemoteClient; deviceId: string; seq: number; next: number; index: number }> = [];
  let gate!: RemoteClient;
  let nextExpected = 0;
  process.on('message', async (m: { setup?: StaffSetup; order?: StaffOrder }) => {
    try {
      if (m.setup) {
        setup = m.setup;
        judges = await Promise.all(
          setup.judges.map(async (email, index) => {
            const client = remoteClient(setup.base);
            const res = await client.signIn(email, setup.password);
            if (res.status !== 200) throw new Error(`judge sign-in answered ${res.status}: ${res.text}`);
            return { email, client, deviceId: randomUUID(), seq: 0, next: index, index };
          }),
        );
        gate = remoteClient(setup.base);
        const res = await gate.signIn(setup.gate, setup.password);
        if (res.status !== 200) throw new Error(`gate sign-in answered ${res.status}`);
        process.send!({ ready: true });
      }
      if (m.order) process.send!(await run(m.order));
    } catch (err) {
      process.send!({ error: (err as Error).stack ?? String(err) });
    }
  });

  async function run(order: StaffOrder): Promise<StaffTally> {
    const tally: StaffTally = { scores: stream(), lookups: stream(), checkIns: stream(), posted: [], checkedIn: [] };
    const until = performance.now() + order.seconds * 1000;
    const cars = setup.judgedEntryIds;
    const judging = order.sheetsPerSecond <= 0 ? [] : judges.map(async (j) => {
      const every = 1000 / order.sheetsPerSecond;
      await sleep(Math.random() * every); // the judges do not all press at once
      while (performance.now() < until) {
        const started = performance.now();
        // Each judge walks the cars in a stride of its own, so no two of a judge's sheets in a run name the same car.
        const entryId = cars[j.next % cars.length]!;
        j.next += judges.length;
        const now = new Date().toISOString();
        const lines = setup.criteria.map((c) => ({ clientId: randomUUID(), deviceTime: now, sequence: ++j.seq, entryId, criterionId: c.id, points: (entryId * 7 + c.id * 3 + j.index) % (c.maxPoints + 1), comment: '' }));
        let applied = false;
        const status = await timed(tally.scores, async () => {
          const res = await j.client.post(`/api/events/${setup.eventId}/scores`, { deviceId: j.deviceId, scores: lines });
          applied = res.status === 200 && (res.body as { applied: Array<{ applied: boolean }> }).applied.every((a) => a.applied);
          return res;
        });
        if (status === 200 && applied) for (const l of lines) tally.posted.push({ judgeEmail: j.email, entryId, criterionId: l.criterionId, points: l.points });
        await sleep(started + every - performance.now());
      }
    });
    const atGate = (async () => {
      if (order.carsPerSecond <= 0) return;
      const every = 1000 / order.carsPerSecond;
      while (performance.now() < until) {
        const started = performance.now();
        const number = order.checkIn ? setup.expectedNumbers[nextExpected++]! : setup.expectedNumbers[(nextExpected++) % setup.expectedNumbers.length]!;
        if (number === undefined) throw new Error('the gate ran out of expected cars: seed more');
        await timed(tally.lookups, () => gate.get(`/api/events/${setup.eventId}/gate/lookup?number=${number}`));
        if (order.checkIn) {
          const status = await timed(tally.checkIns, () => gate.post(`/api/events/${setup.eventId}/gate/check-in`, { number, takeCash: false }));
          if (status === 200) tally.checkedIn.push(number);
        }
        await sleep(started + every - performance.now());
      }
    })();
    await Promise.all([...judging, atGate]);
    return tally;
  }
}

if (process.argv.includes('--staff')) await staffMain();

/** The judges and the gate of the bench server's show-morning scenario, signed in and ready to work. */
export function startMorningStaff({ base, scenario: s }: { base: string; scenario: Scenario }) {
  const show = s.morning!;
  return startStaff({
    base,
    eventId: show.id,
    password: s.password,
    judges: s.judges.map((j) => j.email),
    gate: s.gate.email,
    judgedEntryIds: show.judgedEntryIds,
    criteria: show.criterionIds.map((id, i) => ({ id, maxPoints: [10, 10, 5][i]! })),
    expectedNumbers: show.expectedNumbers,
  });
}
