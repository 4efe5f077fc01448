import { Op, Sequelize } from 'sequelize';
import type { WhereOptions } from 'sequelize';

/**
 * A condition "column contains text", ignoring ASCII case. instr() (SQLite) and strpos()
 * (PostgreSQL) take the text literally, so %, _ and backslashes in a search need no escaping;
 * the text travels as a bound parameter.
 */
export function contains(sequelize: Sequelize, column: string, text: string): WhereOptions {
  const position = sequelize.getDialect() === 'postgres' ? 'strpos' : 'instr';
  return Sequelize.where(Sequelize.fn(position, Sequelize.fn('lower', Sequelize.col(column)), text.toLowerCase()), Op.gt, 0);
}

/**
 * An ORDER BY term that sorts text ignoring ASCII case, the same on both databases: SQLite's
 * NOCASE folds ASCII letters only, and on PostgreSQL lower() under the byte-order "C" collation
 * does the same whatever locale the server was created with.
 */
export function orderNoCase(sequelize: Sequelize, column: string): string {
  return sequelize.getDialect() === 'postgres' ? `lower(${column}) COLLATE "C"` : `${column} COLLATE NOCASE`;
}
