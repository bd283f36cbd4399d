import PgBoss from 'pg-boss';
import { QueryTypes, type Transaction } from 'sequelize';
import { JobWakeListener, JOB_WAKE_CHANNEL } from './wake-listener';
import { config } from '../config';
import { logger } from '../logger';
import { sequelize } from '../db/sequelize';

/** The queues Placard uses, each made with createQueue() before anything is sent to it (pg-boss 10 drops sends to unknown queues). */
export const MAIL_QUEUE = 'mail';
/** Mail that failed every retry is moved here and kept, so an administrator can see and resend it. */
export const MAIL_UNDELIVERED_QUEUE = 'mail-undelivered';
/** Refunds of entry fees paid online, sent to the payment service after a withdrawal commits. */
export const REFUND_QUEUE = 'entry-refund';
/** Card work (bulk prints of numbered cards, show reminders with the owner's card); named by config beside the storage it uses. */
export const CARD_QUEUE = config.cardQueue;
/** Every minute, lapsed waiting-list offers pass to the next in line even when nobody opens the show. */
export const OFFER_SWEEP_QUEUE = 'offer-sweep';
export const OFFER_SWEEP_CRON = '* * * * *';

export type JobQueueOptions = {
  connectionString: string;
  /** pg-boss keeps its tables in its own schema, which it creates and migrates itself on start. */
  schema?: string;
  /** Names the queue's connections in pg_stat_activity. */
  applicationName?: string;
  /** Maintenance (expiring, archiving, retrying stuck jobs) runs in processes that work jobs. */
  supervise: boolean;
  /** Timekeeping: this process turns the stored schedules (cron) into jobs; pg-boss lets one process at a time do it per minute. */
  schedule?: boolean;
  pollSeconds: number;
  mailRetryDelaySeconds: number;
  mailRetryLimit: number;
  /** First wait before sending again a message whose acknowledgement was lost (doubled each time); default 15 minutes. */
  mailLostAckRetrySeconds?: number;
};

/**
 * What a handler is told besides its job. `handBack` is aborted when the process is stopping and the
 * grace period is over: a long job watching it puts its work back on the queue for another worker
 * and returns (a short one simply finishes within the grace period).
 */
export type JobContext = { handBack: AbortSignal };

/** After the hand-back signal, how long handlers have to put their work back before pg-boss fails it (its retries then apply). */
const HAND_BACK_MS = 5_000;

/**
 * pg-boss on the same PostgreSQL, with its queues made. `start()` is idempotent, so any process that
 * sends (a request, a seeder) starts it on first use; the server also works the jobs.
 */
export class JobQueue {
  readonly boss: PgBoss;
  private starting?: Promise<PgBoss>;
  private stopInProgress?: Promise<void>;
  private workers: { id: string; name: string }[] = [];
  private listener?: JobWakeListener;
  /** The handlers running now in this process. */
  private readonly inHand = new Set<Promise<void>>();
  private handBack = new AbortController();
  private stoppingNow = new AbortController();

  constructor(readonly options: JobQueueOptions) {
    this.boss = new PgBoss({
      connectionString: options.connectionString,
      schema: options.schema ?? 'pgboss',
      application_name: options.applicationName ?? 'placard-jobs',
      max: 4,
      supervise: options.supervise,
      schedule: options.schedule ?? false,
    });
    // A database restart makes idle pool clients and the polling loop fail: log it and carry on
    // (pg-boss reconnects on its next query). Without a listener the 'error' event would end the process.
    this.boss.on('error', (err: Error) => logger.error({ err }, 'job queue: database error (jobs wait until it is back)'));
  }

  start(): Promise<PgBoss> {
    this.starting ??= this.open().catch((err: unknown) => {
      this.starting = undefined; // let a later call try again, e.g. once the database is back
      throw err;
    });
    return this.starting;
  }

  private async open(): Promise<PgBoss> {
    await this.boss.start();
    const mail = {
      retryLimit: this.options.mailRetryLimit,
      retryDelay: this.options.mailRetryDelaySeconds,
      retryBackoff: true,
      // An attempt that takes longer than this is treated as lost and retried; the SMTP timeouts are far shorter.
      expireInSeconds: 5 * 60,
      deadLetter: MAIL_UNDELIVERED_QUEUE,
    };
    await this.boss.createQueue(MAIL_UNDELIVERED_QUEUE, { name: MAIL_UNDELIVERED_QUEUE, retentionMinutes: 60 * 24 * 30 });
    await this.boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...mail });
    await this.boss.updateQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...mail }); // settings changed in config apply to the existing queue
    // A refund retries for a day: the payment service's idempotency key makes a retry after a lost answer safe.
    await this.boss.createQueue(REFUND_QUEUE, { name: REFUND_QUEUE, retryLimit: 20, retryDelay: 30, retryBackoff: true, expireInSeconds: 5 * 60 });
    // Timed work is a scheduled job, not a timer in one process: whichever process keeps time sends it, any worker runs it.
    await this.boss.createQueue(OFFER_SWEEP_QUEUE, { name: OFFER_SWEEP_QUEUE, retryLimit: 0, expireInSeconds: 60 });
    await this.boss.schedule(OFFER_SWEEP_QUEUE, OFFER_SWEEP_CRON, {}, { tz: 'UTC' });
    return this.boss;
  }

  private cardQueue?: Promise<void>;

  /**
   * The card queue, made on first use by a process that prints or works cards. Under test each process
   * has a queue of its own (config.cardQueue), and making a queue attaches a table to pg-boss's job
   * table, which waits on every process queuing a job at that moment: a process that never prints
   * never makes one. Call it before a transaction that sends a card job.
   */
  async prepareCardQueue(): Promise<void> {
    await this.start();
    // A print of hundreds of cards takes a minute at most; a lost worker's job is tried again after this.
    this.cardQueue ??= this.createQueueAlone(CARD_QUEUE, { retryLimit: 2, retryDelay: 5, expireInSeconds: 15 * 60 }).catch((err: unknown) => {
      this.cardQueue = undefined;
      throw err;
    });
    await this.cardQueue;
  }

  /**
   * Makes a queue while no other process makes one: pg-boss's create_queue inserts the queue's row and then
   * adds foreign keys to that table, so two processes making two queues at the same moment deadlock (and one
   * answered its organiser's first card print with a 500). A transaction-level advisory lock, held for the making only.
   */
  async createQueueAlone(name: string, options: Omit<PgBoss.Queue, 'name'>): Promise<void> {
    const boss = await this.start();
    await sequelize.transaction(async (transaction) => {
      await sequelize.query("SELECT pg_advisory_xact_lock(hashtext('placard:create-queue'))", { transaction });
      await boss.createQueue(name, { ...options, name });
    });
  }

  /**
   * Works the named queue one job at a time; returns when the worker is registered. A worker that
   * found a job asks again at once (a backlog drains at the speed of its jobs, not one per poll), and
   * a job committed by any process wakes it through PostgreSQL's LISTEN/NOTIFY; the poll is the fallback.
   */
  async work<T extends object>(name: string, handler: (job: PgBoss.Job<T>, context: JobContext) => Promise<void>, { concurrency = 1 } = {}): Promise<void> {
    const boss = await this.start();
    if (name === CARD_QUEUE) await this.prepareCardQueue();
    // Each loop works one job at a time; several loops take turns on the queue (a job is fetched by one only).
    for (let i = 0; i < concurrency; i++) {
      const id: string = await boss.work<T>(name, { batchSize: 1, pollingIntervalSeconds: this.options.pollSeconds }, async ([job]) => {
        if (!job) return;
        const run = handler(job, { handBack: this.handBack.signal });
        this.inHand.add(run);
        try {
          await run;
        } finally {
          this.inHand.delete(run);
          if (!this.stoppingNow.signal.aborted) boss.notifyWorker(id);
        }
      });
      this.workers.push({ id, name });
    }
    this.listener ??= new JobWakeListener(this.options.connectionString, (queue) => this.wake(queue));
    await this.listener.start();
  }

  /** Wakes this process's workers (of one queue, or all) now instead of at their next poll. */
  wake(queue?: string): void {
    for (const w of this.workers) if (queue === undefined || w.name === queue) this.boss.notifyWorker(w.id);
  }

  /**
   * Sends a job; inside `transaction` the job exists only if that transaction commits. Workers in
   * every process, this one included, hear of it on commit through their wake listener (a notification
   * sent in a transaction is delivered when it commits).
   */
  async send(name: string, data: object, transaction?: Transaction, options: { startAfterSeconds?: number } = {}): Promise<string> {
    const boss = await this.start();
    if (name === CARD_QUEUE) await this.prepareCardQueue();
    const timing = options.startAfterSeconds ? { startAfter: options.startAfterSeconds } : {};
    const id = await boss.send(name, data, transaction ? { ...timing, db: inTransaction(transaction) } : timing);
    if (!id) throw new Error(`job queue: ${name} refused the job (is the queue created?)`);
    await sequelize.query('SELECT pg_notify($1, $2)', { bind: [JOB_WAKE_CHANNEL, name], transaction, type: QueryTypes.SELECT }).catch((err: unknown) => {
      // The job is stored; a worker's poll finds it even if the wake-up is lost.
      if (transaction) throw err;
      logger.warn({ err }, 'job queue: wake-up not sent (the next poll finds the job)');
    });
    return id;
  }

  /** Aborted as soon as the process starts to stop: timed upkeep of this process's workers ends with it. */
  get stopping(): AbortSignal {
    return this.stoppingNow.signal;
  }

  /**
   * Stops gracefully: takes no more jobs; lets a job in hand finish within `graceMs`; after that tells
   * the handlers to hand their job back (a bulk print goes back to the queue, and another worker resumes
   * it from the cards already drawn); whatever is still running after that pg-boss fails, and its retry
   * settings send it to another worker. Then closes the pool.
   */
  stop(graceMs = config.jobStopGraceMs): Promise<void> {
    if (!this.starting) return this.stopInProgress ?? Promise.resolve();
    this.stopInProgress ??= this.stopWithin(this.starting, graceMs).finally(() => {
      this.starting = undefined;
      this.stopInProgress = undefined;
      this.workers = [];
      this.handBack = new AbortController();
      this.stoppingNow = new AbortController();
    });
    return this.stopInProgress;
  }

  private async stopWithin(starting: Promise<PgBoss>, graceMs: number): Promise<void> {
    this.stoppingNow.abort();
    await this.listener?.stop();
    this.listener = undefined;
    if (await starting.then(() => true, () => false)) {
      for (const w of this.workers) await this.boss.offWork({ id: w.id }).catch((err: unknown) => logger.error({ err }, 'job queue: could not stop a worker'));
      if (!(await settledWithin(this.inHand, graceMs))) {
        logger.warn({ jobs: this.inHand.size, graceMs }, 'job queue: stopping; the jobs in hand go back to the queue');
        this.handBack.abort();
        await settledWithin(this.inHand, HAND_BACK_MS);
      }
    }
    // Anything still in hand is failed by pg-boss here (and retried per its queue's settings).
    await this.boss.stop({ graceful: true, timeout: 1_000, wait: true }).catch((err: unknown) => logger.error({ err }, 'job queue: stop failed'));
  }
}

/** Whether the set emptied within `ms` (a job fetched just as the workers stopped joins it late, and is waited for too). */
async function settledWithin(running: Set<Promise<void>>, ms: number): Promise<boolean> {
  const deadline = Date.now() + ms;
  while (running.size > 0) {
    const left = deadline - Date.now();
    if (left <= 0) return false;
    let timer: NodeJS.Timeout | undefined;
    const late = new Promise<void>((resolve) => (timer = setTimeout(resolve, left)));
    await Promise.race([Promise.allSettled([...running]), late]);
    clearTimeout(timer);
  }
  return true;
}

/** pg-boss's way to write a job through someone else's connection: here, the caller's Sequelize transaction. */
function inTransaction(transaction: Transaction): PgBoss.Db {
  return {
    executeSql: async (text: string, values: unknown[] = []) => {
      const rows = await sequelize.query<Record<string, unknown>>(text, { bind: values.map((v) => v ?? null), transaction, type: QueryTypes.SELECT });
      return { rows };
    },
  };
}

let shared: JobQueue | undefined;

/** The process's queue on the configured database. */
export function jobQueue(): JobQueue {
  shared ??= new JobQueue({
    connectionString: config.databaseUrl,
    // Every process may do the upkeep; pg-boss lets one at a time do it.
    supervise: true,
    // Test runs make their own sweeps when they want one; a server keeps time.
    schedule: config.env !== 'test',
    pollSeconds: config.jobPollSeconds,
    mailRetryDelaySeconds: config.mailRetryDelaySeconds,
    mailRetryLimit: config.mailRetryLimit,
    mailLostAckRetrySeconds: config.mailLostAckRetrySeconds,
  });
  return shared;
}

/** Stops the process's queue, if it was started. */
export async function stopJobQueue(): Promise<void> {
  await shared?.stop();
}
