import type { Sequelize, Transaction } from 'sequelize';
import { QueryTypes } from 'sequelize';

/** Version of the invented demo data set; bump it when the demo changes shape. */
export const DEMO_VERSION = 'demo-1';

/**
 * Steps that put the demo into a fresh database, run in order inside one transaction. Each step
 * must pass the transaction to every query: Sequelize 6 runs a query without it on another
 * SQLite connection, outside the transaction.
 */
export type DemoStep = (sequelize: Sequelize, transaction: Transaction) => Promise<void>;

/**
 * Loads the invented demo once: a database that already records this demo version is left as it
 * is, so restarting the server never duplicates or overwrites anything a user changed.
 * @returns true when the demo was loaded now, false when it was already there
 */
export async function loadDemoOnce(sequelize: Sequelize, steps: DemoStep[]): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const rows = await sequelize.query<{ value: string }>("SELECT value FROM app_meta WHERE key = 'demo'", { type: QueryTypes.SELECT, transaction });
    if (rows.length > 0) return false;
    for (const step of steps) await step(sequelize, transaction);
    await sequelize.query("INSERT INTO app_meta (key, value, updated_at) VALUES ('demo', ?, ?)", {
      replacements: [DEMO_VERSION, new Date().toISOString()],
      transaction,
    });
    return true;
  });
}
