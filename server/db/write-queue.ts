import { Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize';

/** How often a transaction that met SQLITE_BUSY or SQLITE_LOCKED is tried again, and the first pause. */
export const BUSY_RETRY = { attempts: 8, firstDelayMs: 20, maxDelayMs: 1000 };

/** True for SQLite's "the database is busy or locked" errors, whichever wrapper they arrive in. */
export function isBusyError(error: unknown): boolean {
  for (let e = error as { code?: unknown; parent?: unknown; original?: unknown; message?: unknown } | undefined, depth = 0; e && depth < 4; depth++) {
    if (e.code === 'SQLITE_BUSY' || e.code === 'SQLITE_LOCKED') return true;
    if (typeof e.message === 'string' && /SQLITE_(BUSY|LOCKED)/.test(e.message)) return true;
    e = (e.parent ?? e.original) as typeof e;
  }
  return false;
}

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Runs `attempt` again after SQLITE_BUSY or SQLITE_LOCKED with a growing, jittered pause, so a lock
 * held by another process (a backup, a migration CLI) is waited out instead of reaching a user.
 * `retryable` picks the errors worth another try (PostgreSQL passes its own).
 */
export async function retryWhenBusy<T>(attempt: () => Promise<T>, policy = BUSY_RETRY, retryable: (error: unknown) => boolean = isBusyError): Promise<T> {
  for (let n = 1; ; n++) {
    try {
      return await attempt();
    } catch (error) {
      if (n >= policy.attempts || !retryable(error)) throw error;
      const delay = Math.min(policy.maxDelayMs, policy.firstDelayMs * 2 ** (n - 1));
      await pause(delay / 2 + Math.random() * (delay / 2));
    }
  }
}

type Managed = (t: Transaction) => Promise<unknown>;

/**
 * Makes every managed `sequelize.transaction(fn)` of this process run one at a time, as
 * BEGIN IMMEDIATE, retried when busy.
 *
 * Why: Sequelize's SQLite dialect opens a separate connection per transaction. A DEFERRED
 * transaction that reads and then writes fails at once with SQLITE_BUSY when another connection
 * committed in between (busy_timeout cannot help: SQLite documentation, "Isolation In SQLite" and
 * "BEGIN TRANSACTION"); and many transactions waiting in busy_timeout occupy libuv's few worker
 * threads while the lock holder needs one to commit. SQLite has one writer at a time anyway, so a
 * queue in the process costs no throughput and turns contention into waiting.
 *
 * Callbacks must not open a second managed transaction themselves (pass `t` instead): nested ones
 * would wait for their parent forever. Unmanaged transactions (no callback) pass through unchanged.
 * `close()` first waits for the queue to empty.
 */
export function serialiseTransactions(sequelize: Sequelize): void {
  const original = sequelize.transaction.bind(sequelize) as (options?: unknown, fn?: Managed) => Promise<unknown>;
  let tail: Promise<unknown> = Promise.resolve();
  const queued = (options: unknown, fn: Managed) => {
    const run = () =>
      retryWhenBusy(() => original({ type: Transaction.TYPES.IMMEDIATE, ...(options as object) }, fn));
    const result = tail.then(run, run);
    tail = result.catch(() => undefined);
    return result;
  };
  (sequelize as unknown as { transaction: (a?: unknown, b?: unknown) => Promise<unknown> }).transaction = (a?: unknown, b?: unknown) => {
    if (typeof a === 'function') return queued({}, a as Managed);
    if (typeof b === 'function') return queued(a ?? {}, b as Managed);
    return original(a);
  };
  // Requests whose clients have gone still have their saves queued: let them commit before closing.
  const close = sequelize.close.bind(sequelize);
  sequelize.close = async () => {
    for (let seen: Promise<unknown> | undefined; seen !== tail; ) await (seen = tail);
    return close();
  };
}
