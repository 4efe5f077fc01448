import { existsSync, mkdirSync, renameSync, rmSync } from 'node:fs';
import { dirname } from 'node:path';
import sqlite3 from 'sqlite3';
import { migrations } from './migrations';

type Db = InstanceType<typeof sqlite3.Database>;

/** The driver's backup handle (sqlite3 ships it without type declarations). */
interface Backup {
  step(pages: number, cb: (err: Error | null) => void): void;
  finish(cb: (err: Error | null) => void): void;
}
type BackupStart = (file: string, dest: string, source: string, filenameIsDest: boolean, cb: (err: Error | null) => void) => Backup;

const open = (path: string, mode: number) =>
  new Promise<Db>((resolve, reject) => {
    const db: Db = new sqlite3.Database(path, mode, (err) => (err ? reject(err) : resolve(db)));
  });
const close = (db: Db) => new Promise<void>((resolve, reject) => db.close((err) => (err ? reject(err) : resolve())));
const all = <T>(db: Db, sql: string) => new Promise<T[]>((resolve, reject) => db.all(sql, (err, rows) => (err ? reject(err) : resolve(rows as T[]))));
const exec = (db: Db, sql: string) => new Promise<void>((resolve, reject) => db.exec(sql, (err) => (err ? reject(err) : resolve())));

/**
 * Runs SQLite's online backup from `db` to or from `file` in one step, retrying while the source is
 * busy (SQLite C API, sqlite3_backup_init / _step / _finish).
 * @param intoFile true: copy db → file; false: copy file → db
 */
function onlineBackup(db: Db, file: string, intoFile: boolean): Promise<void> {
  return new Promise((resolve, reject) => {
    const start = (db as unknown as { backup: BackupStart }).backup.bind(db);
    const backup = start(file, 'main', 'main', intoFile, (err) => {
      if (err) return reject(err);
      backup.step(-1, (stepErr) => {
        if (stepErr) return reject(stepErr);
        backup.finish((finishErr) => (finishErr ? reject(finishErr) : resolve()));
      });
    });
  });
}

/** What a check of a database file found. */
export interface DatabaseCheck {
  ok: boolean;
  problems: string[];
  migrations: string[];
}

/**
 * Checks a database file before it is trusted: SQLite's integrity check says "ok", and it was made
 * by this product (its migrations table lists only migrations this version knows).
 */
export async function checkDatabaseFile(path: string): Promise<DatabaseCheck> {
  if (!existsSync(path)) return { ok: false, problems: [`${path} does not exist`], migrations: [] };
  let db: Db;
  try {
    db = await open(path, sqlite3.OPEN_READONLY);
  } catch (error) {
    return { ok: false, problems: [`${path} cannot be opened: ${(error as Error).message}`], migrations: [] };
  }
  const problems: string[] = [];
  let names: string[] = [];
  try {
    const integrity = await all<{ integrity_check: string }>(db, 'PRAGMA integrity_check');
    if (integrity.map((r) => r.integrity_check).join() !== 'ok') problems.push(`integrity check failed: ${integrity.map((r) => r.integrity_check).join('; ')}`);
    names = (await all<{ name: string }>(db, 'SELECT name FROM SequelizeMeta ORDER BY name')).map((r) => r.name);
    const known = new Set(migrations.map((m) => m.name));
    const unknown = names.filter((n) => !known.has(n));
    if (unknown.length) problems.push(`made by a newer version of Photon Parity (unknown migrations: ${unknown.join(', ')})`);
    // An empty schema would pass the other checks and replace every row with nothing.
    if (names.length === 0) problems.push('not a Photon Parity database: no migration has been applied to it');
  } catch (error) {
    problems.push(`not a Photon Parity database: ${(error as Error).message}`);
  } finally {
    await close(db);
  }
  return { ok: problems.length === 0, problems, migrations: names };
}

/**
 * The online backup copies the live file's header, which marks it as write-ahead-logged, so every
 * later open (even read-only, as the check does) would leave `-wal` and `-shm` files beside it.
 * A rollback journal makes the copy one self-contained file (SQLite documentation, "Write-Ahead
 * Logging", section "Persistence of WAL mode").
 */
async function selfContained(path: string): Promise<void> {
  const db = await open(path, sqlite3.OPEN_READWRITE);
  try {
    await exec(db, 'PRAGMA journal_mode = DELETE');
  } finally {
    await close(db);
  }
}

/**
 * Copies the live database to `dest` with SQLite's online backup, safe while the server is writing;
 * the copy is checked before it replaces anything at `dest`. Uploaded files live in the database,
 * so they are part of the copy.
 */
export async function backupDatabase(livePath: string, dest: string): Promise<DatabaseCheck> {
  if (!existsSync(livePath)) throw new Error(`there is no database at ${livePath}`);
  mkdirSync(dirname(dest), { recursive: true });
  const partial = `${dest}.partial`;
  rmSync(partial, { force: true });
  const live = await open(livePath, sqlite3.OPEN_READWRITE);
  try {
    await exec(live, 'PRAGMA busy_timeout = 10000');
    await onlineBackup(live, partial, true);
  } finally {
    await close(live);
  }
  await selfContained(partial);
  const check = await checkDatabaseFile(partial);
  if (!check.ok) {
    rmSync(partial, { force: true });
    throw new Error(`the copy failed its check: ${check.problems.join('; ')}`);
  }
  renameSync(partial, dest);
  return check;
}

/**
 * Puts a backup back as the live database after checking it. The copy goes through the online
 * backup API into the live file, so a running server sees the restored content on its next query.
 */
export async function restoreDatabase(backupFile: string, livePath: string): Promise<DatabaseCheck> {
  const check = await checkDatabaseFile(backupFile);
  if (!check.ok) throw new Error(`${backupFile} was not restored: ${check.problems.join('; ')}`);
  mkdirSync(dirname(livePath), { recursive: true });
  const live = await open(livePath, sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE);
  try {
    await exec(live, 'PRAGMA busy_timeout = 10000');
    await onlineBackup(live, backupFile, false);
  } finally {
    await close(live);
  }
  const after = await checkDatabaseFile(livePath);
  if (!after.ok) throw new Error(`the restored database failed its check: ${after.problems.join('; ')}`);
  return after;
}
