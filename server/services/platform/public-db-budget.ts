import { config } from '../../config';
import { UnavailableError } from '../../errors';

/**
 * The public pages' share of the database pool. Visitors' pages (a cache miss of /, /c/, /e/, a search,
 * the public JSON) run their queries inside `publicDbWork`, which lets at most `size` of them run at
 * once in this process: each holds at most one pooled connection at a time (their queries run one
 * after another), so the rest of the pool (`DB_POOL_MAX` − `PUBLIC_DB_CONNECTIONS`) always stays free
 * for signed-in work (judges' sheets, the gate, organisers), however many visitors arrive at once.
 * A visitor waits at most `DB_CONNECT_TIMEOUT_MS` for a turn (as for a connection), and at most
 * `maxWaiting` wait at all: beyond that the answer is a 503 at once, so a crowd cannot pile up memory.
 */
export class PublicDbBudget {
  private active = 0;
  private waiting: Array<{ go: () => void; timer: NodeJS.Timeout }> = [];
  /** The most tasks seen running at once (tests read it). */
  peak = 0;

  constructor(
    public size: number,
    public maxWaiting: number,
    public waitMs: number,
  ) {}

  get running(): number {
    return this.active;
  }

  get queued(): number {
    return this.waiting.length;
  }

  async run<T>(task: () => Promise<T>): Promise<T> {
    if (this.active >= this.size) {
      if (this.waiting.length >= this.maxWaiting) throw new PublicPagesBusyError();
      await new Promise<void>((resolve, reject) => {
        const entry = {
          go: () => {
            clearTimeout(entry.timer);
            resolve();
          },
          timer: setTimeout(() => {
            this.waiting = this.waiting.filter((w) => w !== entry);
            reject(new PublicPagesBusyError());
          }, this.waitMs),
        };
        this.waiting.push(entry);
      });
    } else this.active++;
    this.peak = Math.max(this.peak, this.active);
    try {
      return await task();
    } finally {
      const next = this.waiting.shift();
      if (next) next.go(); // the turn passes straight to the next in line
      else this.active--;
    }
  }
}

/** Too many visitors' pages are waiting for the database: a 503, as for a pool with no free connection. */
export class PublicPagesBusyError extends UnavailableError {
  constructor() {
    super('Many visitors at once: try again in a moment.');
  }
}

export const publicDbBudget = new PublicDbBudget(config.publicDbConnections, config.publicDbMaxWaiting, config.dbConnectTimeoutMs);

/** Runs a public page's database work within the public share of the pool. */
export const publicDbWork = <T>(task: () => Promise<T>): Promise<T> => publicDbBudget.run(task);
