import { afterAll, describe, expect, it } from 'vitest';
import '@server/models/index';
import { randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { sequelize } from '@server/db/sequelize';
import { config } from '@server/config';
import { JobQueue } from '@server/jobs/queue';

// What a worker does with the job in hand when it is told to stop (SIGTERM calls JobQueue.stop):
// it takes no new job, lets the one in hand finish within the grace period, and after that tells the
// handler to hand it back. The SIGKILL and SIGTERM of real worker processes mid-print are in
// tests/server/scale/worker-stops.test.ts.

const schema = `pgboss_t${randomBytes(4).toString('hex')}`;
const queues: JobQueue[] = [];

/** A queue of its own (a pg-boss schema of its own) working the queue `name` with this handler; `inHand` resolves when a job starts. */
async function queueWithWork(name: string, handler: (handBack: AbortSignal) => Promise<string>) {
  const queue = new JobQueue({ connectionString: config.databaseUrl, schema, applicationName: `placard-test-${schema}`, supervise: false, pollSeconds: 0.5, mailRetryDelaySeconds: 1, mailRetryLimit: 1 });
  queues.push(queue);
  const boss = await queue.start();
  await boss.createQueue(name, { name });
  const events: string[] = [];
  let started!: () => void;
  const inHand = new Promise<void>((resolve) => (started = resolve));
  await queue.work(name, async (_job, { handBack }) => {
    events.push('started');
    started();
    events.push(await handler(handBack));
  });
  return { queue, events, inHand };
}

const stateOf = async (id: string) =>
  (await sequelize.query<{ state: string }>(`SELECT state FROM ${schema}.job WHERE id = $1`, { bind: [id], type: QueryTypes.SELECT }))[0]?.state;

afterAll(async () => {
  for (const q of queues) await q.stop(0);
  await sequelize.query(`DROP SCHEMA IF EXISTS ${schema} CASCADE`);
});

describe('a job queue told to stop', () => {
  it('lets the job in hand finish within the grace period, and takes no other', async () => {
    // The job takes 300 ms of work; the grace period is far longer.
    const { queue, events, inHand } = await queueWithWork('stop-after-work', async (handBack) => {
      await new Promise((r) => setTimeout(r, 300));
      return handBack.aborted ? 'handed back' : 'finished';
    });
    const first = await queue.send('stop-after-work', {});
    await inHand;
    const second = await queue.send('stop-after-work', {}); // waits behind the first
    await queue.stop(10_000).then(() => events.push('stopped'));
    expect(events).toEqual(['started', 'finished', 'stopped']);
    expect([await stateOf(first), await stateOf(second)]).toEqual(['completed', 'created']);
  });

  it('after the grace period tells the handler to hand the job back, and closes once it has', async () => {
    const { queue, events, inHand } = await queueWithWork('stop-hand-back', (handBack) =>
      new Promise((resolve) => handBack.addEventListener('abort', () => resolve('handed back'), { once: true })),
    );
    const job = await queue.send('stop-hand-back', {});
    await inHand;
    await queue.stop(100).then(() => events.push('stopped'));
    expect(events).toEqual(['started', 'handed back', 'stopped']);
    // The handler returned before the queue closed: its job is completed (one still running then is failed, and retried).
    expect(await stateOf(job)).toBe('completed');
  });
});
