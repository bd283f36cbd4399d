import { ChannelListener } from '../db/channel-listener';

/** The channel on which a committed job names its queue, so workers in other processes start at once. */
export const JOB_WAKE_CHANNEL = 'placard_jobs';

/**
 * One connection that LISTENs for committed jobs and calls `wake(queue)`. When the database goes away
 * it reconnects with backoff; meanwhile the workers' own polls find every job, so nothing waits on it.
 */
export class JobWakeListener extends ChannelListener {
  constructor(connectionString: string, wake: (queue?: string) => void) {
    super({
      connectionString,
      channel: JOB_WAKE_CHANNEL,
      name: 'placard-job-wake',
      onMessage: (queue) => queue && wake(queue),
      // Jobs committed while this was away are found at once rather than at the next poll.
      onListening: () => wake(),
      meanwhile: 'workers keep polling meanwhile',
    });
  }
}
