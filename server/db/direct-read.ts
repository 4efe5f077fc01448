import { QueryTypes } from 'sequelize';
import type { Model, ModelStatic, Sequelize } from 'sequelize';

interface SqliteReads {
  all(sql: string, params: unknown[], cb: (err: Error | null, rows: unknown[]) => void): void;
}

/** At most this many plain reads wait on libuv's thread pool at once (it has 4 threads, shared with writes). */
const READS_AT_ONCE = 2;

interface ReadLane {
  connection: Promise<SqliteReads>;
  active: number;
  waiting: Array<() => void>;
}

const lanes = new WeakMap<Sequelize, ReadLane>();

/**
 * The connection plain reads use: one of their own, opened through Sequelize's connection manager
 * (so it gets the product's PRAGMAs and is closed with the others). Not Sequelize's shared one:
 * Sequelize runs its queries there in `serialize` mode, and the driver starts a serialized query
 * only once nothing else is pending on that connection, so a steady stream of plain reads on it
 * would hold Sequelize's queries back for as long as the stream lasts.
 */
function laneOf(sequelize: Sequelize): ReadLane {
  let lane = lanes.get(sequelize);
  if (!lane) {
    const manager = sequelize.connectionManager as unknown as { getConnection(o: object): Promise<SqliteReads> };
    const connection = manager.getConnection({ uuid: 'plain-reads' });
    lane = { connection, active: 0, waiting: [] };
    lanes.set(sequelize, lane);
    // A connection that failed to open is tried again by the next read.
    connection.catch(() => lanes.delete(sequelize));
  }
  return lane;
}

/**
 * Runs one SELECT outside any transaction and returns its rows as the driver gives them.
 *
 * On SQLite it goes straight to the driver, on a connection of its own: Sequelize's SQLite layer
 * runs each query alone on its shared connection (`serialize`) and first asks `PRAGMA table_info`
 * of every table a model query names, so each read costs two round trips to libuv's thread pool
 * with the connection held, and a busy server's reads queue behind one another. Only a few plain
 * reads are handed to the thread pool at a time, so writes still find a free thread. PostgreSQL
 * has a pool and none of this, so there the ordinary query layer is used. `?` marks each parameter
 * in both.
 */
export async function readRows<T extends object>(sequelize: Sequelize, sql: string, params: unknown[]): Promise<T[]> {
  if (sequelize.getDialect() !== 'sqlite') return sequelize.query<T>(sql, { replacements: params, type: QueryTypes.SELECT });
  const lane = laneOf(sequelize);
  if (lane.active >= READS_AT_ONCE) await new Promise<void>((resolve) => lane.waiting.push(resolve));
  lane.active++;
  try {
    const connection = await lane.connection;
    return await new Promise<T[]>((resolve, reject) => connection.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[]))));
  } finally {
    lane.active--;
    lane.waiting.shift()?.();
  }
}

/** The first row of readRows, or undefined. */
export async function readRow<T extends object>(sequelize: Sequelize, sql: string, params: unknown[]): Promise<T | undefined> {
  return (await readRows<T>(sequelize, sql, params))[0];
}

type Convert = (value: unknown) => unknown;

const toDate: Convert = (v) => (v === null || v === undefined ? null : v instanceof Date ? v : new Date(String(v)));
const toBoolean: Convert = (v) => (v === null || v === undefined ? null : v === true || v === 1 || v === '1' || v === 't');
const toNumber: Convert = (v) => (v === null || v === undefined ? null : Number(v));
const asIs: Convert = (v) => (v === undefined ? null : v);

/** How a column's stored value becomes the model attribute's value, by the Sequelize data type's key. */
function converterFor(typeKey: string): Convert {
  if (typeKey === 'DATE') return toDate;
  if (typeKey === 'BOOLEAN') return toBoolean;
  if (typeKey === 'INTEGER' || typeKey === 'BIGINT' || typeKey === 'FLOAT' || typeKey === 'DOUBLE' || typeKey === 'REAL') return toNumber;
  return asIs;
}

/** Reads a model's rows with plain SQL and gives them back as `row.get({ plain: true })` would. */
export interface ModelReader<Row> {
  /** `"alias"."column" AS "attribute"` for every attribute, for a SELECT list. */
  columns: string;
  /** Turns one raw row (selected with `columns`) into the model's plain row. */
  toRow(raw: Record<string, unknown>): Row;
}

const made = new WeakMap<object, Map<string, ModelReader<object>>>();

/** A ModelReader for `model`, its table named `alias` in the query (made once per model and alias). */
export function modelReader<Row extends object>(model: ModelStatic<Model<Row, Partial<Row>>>, alias: string): ModelReader<Row> {
  let byAlias = made.get(model);
  if (!byAlias) made.set(model, (byAlias = new Map()));
  let reader = byAlias.get(alias) as ModelReader<Row> | undefined;
  if (!reader) byAlias.set(alias, (reader = makeReader(model, alias)) as ModelReader<object>);
  return reader;
}

function makeReader<Row extends object>(model: ModelStatic<Model<Row, Partial<Row>>>, alias: string): ModelReader<Row> {
  const declared = model.getAttributes() as Record<string, { field?: string; type: unknown }>;
  const attributes = Object.entries(declared).map(([name, a]) => {
    const type = a.type as { key?: string };
    return { name, field: a.field ?? name, convert: converterFor(type.key ?? '') };
  });
  return {
    columns: attributes.map((a) => `"${alias}"."${a.field}" AS "${a.name}"`).join(', '),
    toRow(raw) {
      const row: Record<string, unknown> = {};
      for (const a of attributes) row[a.name] = a.convert(raw[a.name]);
      return row as Row;
    },
  };
}
