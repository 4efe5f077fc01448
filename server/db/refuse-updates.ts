import type { Sequelize } from 'sequelize';

/**
 * Makes the database itself refuse every UPDATE of `table` with `message`, whichever program
 * connects. SQLite: a BEFORE UPDATE trigger that calls RAISE(ABORT) (SQLite documentation,
 * "CREATE TRIGGER"). PostgreSQL: a row trigger runs a PL/pgSQL function that raises an exception
 * (PostgreSQL documentation, "CREATE TRIGGER" and "Errors and Messages"). Both abort the statement.
 */
export async function refuseUpdates(sequelize: Sequelize, table: string, trigger: string, message: string): Promise<void> {
  if (sequelize.getDialect() === 'postgres') {
    await sequelize.query(`CREATE FUNCTION ${trigger}() RETURNS trigger LANGUAGE plpgsql AS $body$ BEGIN RAISE EXCEPTION '${message}'; END $body$`);
    await sequelize.query(`CREATE TRIGGER ${trigger} BEFORE UPDATE ON ${table} FOR EACH ROW EXECUTE FUNCTION ${trigger}()`);
    return;
  }
  await sequelize.query(
    `CREATE TRIGGER ${trigger} BEFORE UPDATE ON ${table}
     BEGIN SELECT RAISE(ABORT, '${message}'); END`,
  );
}

/** Removes what refuseUpdates made. */
export async function allowUpdates(sequelize: Sequelize, table: string, trigger: string): Promise<void> {
  if (sequelize.getDialect() === 'postgres') {
    await sequelize.query(`DROP TRIGGER IF EXISTS ${trigger} ON ${table}`);
    await sequelize.query(`DROP FUNCTION IF EXISTS ${trigger}()`);
    return;
  }
  await sequelize.query(`DROP TRIGGER IF EXISTS ${trigger}`);
}
