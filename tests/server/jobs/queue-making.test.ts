import { afterAll, describe, expect, it } from 'vitest';
import '@server/models/index';
import { randomUUID } from 'node:crypto';
import { config } from '@server/config';
import { JobQueue, jobQueue } from '@server/jobs/queue';

// pg-boss's create_queue inserts the queue's row, then adds foreign keys to the queue table: two connections
// making two queues at the same moment deadlock (PostgreSQL cancels one, 40P01). Each test process makes a card
// queue of its own on its first print, so two processes printing at once answered one organiser with a 500
// (the authorization matrix's fixtures met it). createQueueAlone() makes one queue at a time across processes.
const other = new JobQueue({ connectionString: config.databaseUrl, supervise: false, pollSeconds: 1, mailRetryDelaySeconds: 1, mailRetryLimit: 1 });
const made: string[] = [];

afterAll(async () => {
  for (const name of made) await jobQueue().boss.deleteQueue(name);
  await other.stop();
});

describe('making queues', () => {
  it('two queues made at the same moment from two pg-boss pools are both made', async () => {
    for (let i = 0; i < 5; i++) {
      const names = [`making-a-${randomUUID()}`, `making-b-${randomUUID()}`];
      made.push(...names);
      await Promise.all([jobQueue().createQueueAlone(names[0]!, { retryLimit: 1 }), other.createQueueAlone(names[1]!, { retryLimit: 1 })]);
      for (const name of names) expect((await jobQueue().boss.getQueue(name))?.name).toBe(name);
    }
  });
});
