import pg from 'pg';
import { logger } from '../logger';

/** The channel on which a committed job names its queue, so workers in other processes start at once. */
export const JOB_WAKE_CHANNEL = 'placard_jobs';

const RECONNECT_FIRST_MS = 500;
const RECONNECT_MOST_MS = 30_000;

/**
 * One connection that LISTENs for committed jobs and calls `wake(queue)`. When the database goes away
 * it reconnects with backoff; meanwhile the workers' own polls find every job, so nothing waits on it.
 */
export class JobWakeListener {
  private client?: pg.Client;
  private stopped = false;
  private retryMs = RECONNECT_FIRST_MS;
  private retryTimer?: NodeJS.Timeout;
  private starting?: Promise<void>;

  constructor(
    private readonly connectionString: string,
    private readonly wake: (queue?: string) => void,
  ) {}

  /** Resolves once listening, or once the first attempt failed (a retry is then scheduled). */
  start(): Promise<void> {
    this.stopped = false;
    this.starting ??= this.connect();
    return this.starting;
  }

  private async connect(): Promise<void> {
    if (this.stopped) return;
    const client = new pg.Client({ connectionString: this.connectionString, application_name: 'placard-job-wake' });
    client.on('notification', (n) => {
      if (n.channel === JOB_WAKE_CHANNEL && n.payload) this.wake(n.payload);
    });
    client.on('error', (err) => this.lost(client, err));
    client.on('end', () => this.lost(client));
    try {
      await client.connect();
      await client.query(`LISTEN ${JOB_WAKE_CHANNEL}`);
      if (this.stopped) return void (await client.end().catch(() => undefined));
      this.client = client;
      this.retryMs = RECONNECT_FIRST_MS;
      // Jobs committed while this was away are found at once rather than at the next poll.
      this.wake();
    } catch (err) {
      this.lost(client, err);
    }
  }

  private lost(client: pg.Client, err?: unknown): void {
    if (this.client && this.client !== client) return; // an old connection's last words
    this.client = undefined;
    client.removeAllListeners('end');
    client.end().catch(() => undefined);
    if (this.stopped || this.retryTimer) return;
    if (err) logger.warn({ err }, 'job wake-ups lost; reconnecting (workers keep polling meanwhile)');
    this.retryTimer = setTimeout(() => {
      this.retryTimer = undefined;
      void this.connect();
    }, this.retryMs);
    this.retryTimer.unref();
    this.retryMs = Math.min(this.retryMs * 2, RECONNECT_MOST_MS);
  }

  async stop(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.retryTimer);
    this.retryTimer = undefined;
    await this.starting?.catch(() => undefined);
    this.starting = undefined;
    const client = this.client;
    this.client = undefined;
    if (client) {
      client.removeAllListeners('end');
      await client.end().catch(() => undefined);
    }
  }
}
