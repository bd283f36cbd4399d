import pg from 'pg';
import { logger } from '../logger';

const RECONNECT_FIRST_MS = 500;
const RECONNECT_MOST_MS = 30_000;

export type ChannelListenerOptions = {
  connectionString: string;
  channel: string;
  /** Names the connection in pg_stat_activity. */
  name: string;
  onMessage: (payload: string) => void;
  /** Called each time the LISTEN is (re)established: whatever was sent while away was missed. */
  onListening: () => void;
  /** Called when the connection is lost, before the retry. */
  onLost?: () => void;
  /** What the warning says a reader does meanwhile. */
  meanwhile: string;
};

/**
 * One connection that LISTENs on a channel (a NOTIFY sent in a transaction arrives when it commits).
 * When the database goes away it reconnects with backoff; callers keep a fallback of their own for
 * the time between, since notifications sent meanwhile are lost.
 */
export class ChannelListener {
  private client?: pg.Client;
  private stopped = false;
  private retryMs = RECONNECT_FIRST_MS;
  private retryTimer?: NodeJS.Timeout;
  private starting?: Promise<void>;

  constructor(private readonly options: ChannelListenerOptions) {}

  get listening(): boolean {
    return this.client !== undefined;
  }

  /** Resolves once listening, or once the first attempt failed (a retry is then scheduled). */
  start(): Promise<void> {
    this.stopped = false;
    this.starting ??= this.connect();
    return this.starting;
  }

  private async connect(): Promise<void> {
    if (this.stopped) return;
    const { connectionString, channel, name } = this.options;
    const client = new pg.Client({ connectionString, application_name: name });
    client.on('notification', (n) => {
      if (n.channel === channel) this.options.onMessage(n.payload ?? '');
    });
    client.on('error', (err) => this.lost(client, err));
    client.on('end', () => this.lost(client));
    try {
      await client.connect();
      await client.query(`LISTEN ${channel}`);
      if (this.stopped) return void (await client.end().catch(() => undefined));
      this.client = client;
      this.retryMs = RECONNECT_FIRST_MS;
      this.options.onListening();
    } catch (err) {
      this.lost(client, err);
    }
  }

  private lost(client: pg.Client, err?: unknown): void {
    if (this.client && this.client !== client) return; // an old connection's last words
    const wasListening = this.client === client;
    this.client = undefined;
    client.removeAllListeners('end');
    client.end().catch(() => undefined);
    if (wasListening) this.options.onLost?.();
    if (this.stopped || this.retryTimer) return;
    if (err) logger.warn({ err, channel: this.options.channel }, `notifications lost; reconnecting (${this.options.meanwhile})`);
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
