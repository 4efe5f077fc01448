import { Router } from 'express';
import { QueryTypes } from 'sequelize';
import { ENGINE_VERSION } from '../../src/engine/version';
import type { AppDeps } from '../app';
import { migrationState } from '../db/migrate';

/**
 * GET /api/health: liveness (the process answers), readiness (the database answers and every
 * migration is applied), the engine version and the database's state. 503 when not ready.
 */
export function healthRouter({ sequelize }: Pick<AppDeps, 'sequelize'>): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    let database;
    try {
      const [row] = await sequelize.query<{ journal_mode: string }>('PRAGMA journal_mode', { type: QueryTypes.SELECT });
      const migrations = await migrationState(sequelize);
      database = { ok: migrations.pending === 0, dialect: sequelize.getDialect(), journalMode: row?.journal_mode, migrations };
    } catch {
      database = { ok: false, dialect: sequelize.getDialect(), migrations: { applied: 0, pending: 0 } };
    }
    res.status(database.ok ? 200 : 503).json({ live: true, ready: database.ok, engineVersion: ENGINE_VERSION, database });
  });
  return router;
}
