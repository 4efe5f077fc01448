import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { boot } from '../../server/boot';
import type { Running } from '../../server/boot';
import { readConfig } from '../../server/config';
import { backupDatabase, checkDatabaseFile, restoreDatabase } from '../../server/db/backup';
import { createLogger } from '../../server/logger';

const dir = mkdtempSync(join(tmpdir(), 'pp-backup-'));
const livePath = join(dir, 'live.sqlite');
let running: Running;

const tableCounts = async (r: Running) => {
  const tables = await r.sequelize.query<{ name: string }>("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name", { type: QueryTypes.SELECT });
  const counts: Record<string, number> = {};
  for (const { name } of tables) {
    const [row] = await r.sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM "${name}"`, { type: QueryTypes.SELECT });
    counts[name] = row!.n;
  }
  return counts;
};

beforeAll(async () => {
  running = await boot(readConfig({ NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: livePath }), createLogger('silent'));
});
afterAll(async () => running?.close());

describe('backup and restore', () => {
  it('copies the live database while the server keeps writing, and the copy passes its check', async () => {
    const before = await tableCounts(running);
    const writes = Array.from({ length: 50 }, (_, i) =>
      running.sequelize.query('INSERT INTO app_meta (key, value, updated_at) VALUES (?, ?, ?)', { replacements: [`k${i}`, 'v', new Date().toISOString()] }),
    );
    const copy = join(dir, 'copy.sqlite');
    const [check] = await Promise.all([backupDatabase(livePath, copy), ...writes]);
    expect(check.ok).toBe(true);
    expect(check.migrations.length).toBeGreaterThan(0);
    expect((await checkDatabaseFile(copy)).ok).toBe(true);
    expect(Object.keys(before).length).toBeGreaterThan(1);
  });

  it('round-trips every table: restore puts back exactly what was backed up', async () => {
    const snapshot = join(dir, 'round-trip.sqlite');
    const original = await tableCounts(running);
    await backupDatabase(livePath, snapshot);
    await running.sequelize.query("DELETE FROM app_meta WHERE key LIKE 'k%'");
    expect((await tableCounts(running)).app_meta).toBeLessThan(original.app_meta!);
    await restoreDatabase(snapshot, livePath);
    expect(await tableCounts(running)).toEqual(original);
  });

  it('refuses to restore a file that is not a Photon Parity database', async () => {
    const junk = join(dir, 'junk.sqlite');
    writeFileSync(junk, 'this is not a database');
    await expect(restoreDatabase(junk, livePath)).rejects.toThrow(/was not restored/);
    expect((await checkDatabaseFile(livePath)).ok).toBe(true);
  });
});
