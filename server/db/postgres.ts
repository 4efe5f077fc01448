import { Sequelize, Transaction } from 'sequelize';
import { ConfigError, describeDatabase } from '../config';
import { retryWhenBusy } from './write-queue';

/**
 * Connections each app instance keeps open at most. Several instances share one server, whose
 * default max_connections is 100 (PostgreSQL documentation, "Connections and Authentication"), so
 * ten per instance leaves room for about eight instances plus maintenance sessions.
 */
export const POSTGRES_POOL = { max: 10, min: 0, idle: 10_000, acquire: 30_000 };

/**
 * SQLSTATEs after which a whole transaction may simply run again: serialization_failure and
 * deadlock_detected (PostgreSQL documentation, Appendix A "PostgreSQL Error Codes", class 40).
 */
const RETRYABLE_SQLSTATES = new Set(['40001', '40P01']);

/** True for a PostgreSQL serialization failure or deadlock, whichever wrapper it arrives in. */
export function isPostgresConflict(error: unknown): boolean {
  for (let e = error as { code?: unknown; parent?: unknown; original?: unknown } | undefined, depth = 0; e && depth < 4; depth++) {
    if (typeof e.code === 'string' && RETRYABLE_SQLSTATES.has(e.code)) return true;
    e = (e.parent ?? e.original) as typeof e;
  }
  return false;
}

/**
 * How often a transaction that lost a serialization conflict is run again. Conflicts are frequent
 * under SERIALIZABLE when many saves touch one workspace at once, and each retry is short, so there
 * are more and quicker attempts than SQLite's lock waits get.
 */
export const CONFLICT_RETRY = { attempts: 20, firstDelayMs: 5, maxDelayMs: 500 };

type Managed = (t: unknown) => Promise<unknown>;

/**
 * Runs every managed `sequelize.transaction(fn)` again after a serialization failure or a deadlock,
 * as the write queue does for SQLITE_BUSY. Transactions run concurrently on the pool; only the
 * retry is added. Unmanaged transactions (no callback) pass through unchanged.
 */
export function retryConflictingTransactions(sequelize: Sequelize): void {
  const original = sequelize.transaction.bind(sequelize) as (options?: unknown, fn?: Managed) => Promise<unknown>;
  const managed = (options: unknown, fn: Managed) => retryWhenBusy(() => original(options, fn), CONFLICT_RETRY, isPostgresConflict);
  (sequelize as unknown as { transaction: (a?: unknown, b?: unknown) => Promise<unknown> }).transaction = (a?: unknown, b?: unknown) => {
    if (typeof a === 'function') return managed({}, a as Managed);
    if (typeof b === 'function') return managed(a ?? {}, b as Managed);
    return original(a);
  };
}

/** Connects to PostgreSQL at `url`; fails fast with a plain message when the server cannot be reached or refuses the login. */
export async function openPostgres(url: string): Promise<Sequelize> {
  const sequelize = new Sequelize(url, {
    dialect: 'postgres',
    logging: false,
    pool: POSTGRES_POOL,
    // Transactions check, then write (a free e-mail, a fixture key). SERIALIZABLE keeps that as safe
    // as SQLite's one writer at a time: a racing pair ends in a serialization failure, which is
    // retried and then sees the other's row, rather than in a unique violation (PostgreSQL
    // documentation, "Transaction Isolation", Serializable Isolation Level).
    isolationLevel: Transaction.ISOLATION_LEVELS.SERIALIZABLE,
    dialectOptions: { connectionTimeoutMillis: 10_000, application_name: 'photon-parity' },
  });
  try {
    await sequelize.authenticate();
  } catch (error) {
    await sequelize.close().catch(() => undefined);
    const cause = error as { parent?: { code?: string; message?: string }; message?: string };
    const reason = cause.parent?.message || cause.parent?.code || cause.message || String(error);
    throw new ConfigError(`PostgreSQL at ${describeDatabase({ databasePath: '', databaseUrl: url })} cannot be opened (${reason}); check DATABASE_URL and that the server is running`);
  }
  retryConflictingTransactions(sequelize);
  return sequelize;
}
