import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { ENGINE_VERSION } from '../../src/engine/version';
import type { AppDeps } from '../app';
import type { DatabaseState } from '../db/connection';
import { readRow } from '../db/direct-read';
import { migrationState } from '../db/migrate';

async function databaseState(sequelize: Sequelize): Promise<DatabaseState> {
  const dialect = sequelize.getDialect();
  try {
    // Probes call this often (a load balancer, every few seconds per instance): plain reads, see server/db/direct-read.ts.
    const journalMode = dialect === 'sqlite' ? (await readRow<{ journal_mode: string }>(sequelize, 'PRAGMA journal_mode', []))?.journal_mode : undefined;
    const migrations = await migrationState(sequelize);
    return { ok: migrations.pending === 0, dialect, journalMode, migrations };
  } catch {
    return { ok: false, dialect, migrations: { applied: 0, pending: 0 } };
  }
}

/**
 * /api/health: liveness and readiness apart, for a process supervisor or a load balancer.
 * - GET /live: 200 whenever the process answers; restart the process only when this fails.
 * - GET /ready: 200 when the database answers and every migration is applied, else 503; send
 *   traffic only while this is 200.
 * - GET /: both, with the engine version and the database's state (503 when not ready).
 */
export function healthRouter({ sequelize }: Pick<AppDeps, 'sequelize'>): Router {
  const router = Router();
  router.get('/live', (_req, res) => {
    res.json({ live: true });
  });
  router.get('/ready', async (_req, res) => {
    const database = await databaseState(sequelize);
    res.status(database.ok ? 200 : 503).json({ ready: database.ok, database });
  });
  router.get('/', async (_req, res) => {
    const database = await databaseState(sequelize);
    res.status(database.ok ? 200 : 503).json({ live: true, ready: database.ok, engineVersion: ENGINE_VERSION, database });
  });
  return router;
}
