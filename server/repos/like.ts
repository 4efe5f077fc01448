import { Op, Sequelize } from 'sequelize';
import type { WhereOptions } from 'sequelize';

/**
 * A condition "column contains text", ignoring ASCII case. instr() takes the text literally, so
 * %, _ and backslashes in a search need no escaping; the text travels as a bound parameter.
 */
export function contains(column: string, text: string): WhereOptions {
  return Sequelize.where(Sequelize.fn('instr', Sequelize.fn('lower', Sequelize.col(column)), text.toLowerCase()), Op.gt, 0);
}
