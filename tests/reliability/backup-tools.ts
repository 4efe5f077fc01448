import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import sqlite3 from 'sqlite3';
import { ApiClient } from '../helpers/api-client';
import { demoAccount } from '../helpers/test-app';
import type { DemoPart } from '../helpers/test-app';

/** What a finished command printed, how it ended, and how long it took. */
export interface CommandRun {
  code: number | string;
  stdout: string;
  stderr: string;
  ms: number;
}

/**
 * `npm run -s <script> -- <file>` in the repository as its own process, pointed at `databasePath`
 * through DATABASE_PATH, exactly as an operator would run it next to a running server.
 */
export function runDbScript(script: 'db:backup' | 'db:restore', file: string, databasePath: string): Promise<CommandRun> {
  const started = performance.now();
  const child = spawn('npm', ['run', '-s', script, '--', file], {
    cwd: process.cwd(),
    env: { ...process.env, NODE_ENV: 'test', DATABASE_PATH: databasePath },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (c: Buffer) => (stdout += c.toString('utf8')));
  child.stderr.on('data', (c: Buffer) => (stderr += c.toString('utf8')));
  return new Promise((resolve, reject) => {
    child.once('error', reject);
    child.once('close', (code, signal) => resolve({ code: code ?? signal ?? -1, stdout, stderr, ms: Math.round(performance.now() - started) }));
  });
}

/** Runs one query against a SQLite file opened read-only, then closes it. */
export function queryFile<T>(path: string, sql: string, params: unknown[] = []): Promise<T[]> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(path, sqlite3.OPEN_READONLY, (openError) => {
      if (openError) return reject(openError);
      db.all(sql, params, (error, rows) => db.close(() => (error ? reject(error) : resolve(rows as T[]))));
    });
  });
}

/** Runs one statement against a SQLite file opened for writing, then closes it. */
export function runOnFile(path: string, sql: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(path, (openError) => {
      if (openError) return reject(openError);
      db.run(sql, (error) => db.close(() => (error ? reject(error) : resolve())));
    });
  });
}

/** Hex SHA-256 of bytes or text. */
export const sha256 = (data: Buffer | string): string => createHash('sha256').update(data).digest('hex');

/** SHA-256 of the file's bytes as they are on disk. */
export const fileSha256 = (path: string): string => sha256(readFileSync(path));

/** One table's content: how many rows, and a SHA-256 over every row in a stable order. */
export interface TableDigest {
  rows: number;
  sha256: string;
}

/**
 * Digests every table of a SQLite file: rows ordered by all their columns (so the order does not
 * depend on how pages were laid out), each row as JSON with BLOBs as hex, hashed together.
 */
export async function tableDigests(path: string): Promise<Record<string, TableDigest>> {
  const tables = await queryFile<{ name: string }>(path, "SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name");
  const out: Record<string, TableDigest> = {};
  for (const { name } of tables) {
    const columns = await queryFile<{ cid: number }>(path, `PRAGMA table_info("${name}")`);
    const order = columns.map((c) => c.cid + 1).join(', ');
    const rows = await queryFile<Record<string, unknown>>(path, `SELECT * FROM "${name}" ORDER BY ${order}`);
    const hash = createHash('sha256');
    for (const row of rows) hash.update(JSON.stringify(Object.entries(row).map(([k, v]) => [k, Buffer.isBuffer(v) ? `x'${v.toString('hex')}'` : v])) + '\n');
    out[name] = { rows: rows.length, sha256: hash.digest('hex') };
  }
  return out;
}

/** A client of `base` signed in as a demo account through Auth.js. */
export async function signedIn(base: string, part: DemoPart): Promise<ApiClient> {
  const client = new ApiClient(base);
  const account = demoAccount(part);
  const reply = await client.signIn(account.email, account.password);
  if (reply.status !== 200 || reply.body.url.includes('error=')) throw new Error(`sign-in as ${part} failed: ${reply.status} ${reply.text}`);
  return client;
}
