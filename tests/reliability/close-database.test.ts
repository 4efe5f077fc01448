import { existsSync, mkdtempSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/connection';
import { readRow } from '../../server/db/direct-read';
import { migrateUp } from '../../server/db/migrate';

const dir = mkdtempSync(join(tmpdir(), 'pp-close-'));
const walLeft = (path: string) => existsSync(`${path}-wal`) && statSync(`${path}-wal`).size > 0;

describe('closing the SQLite database', () => {
  // SQLite documentation, "Write-Ahead Logging": the last connection to close checkpoints the log
  // and deletes it. With the plain-reads connection open beside Sequelize's, closing both at once
  // left the log behind in some runs; twenty rounds catch that race.
  it('leaves no write-ahead log once plain reads and Sequelize queries have both used it (20 rounds)', { timeout: 60_000 }, async () => {
    const left: number[] = [];
    for (let round = 0; round < 20; round++) {
      const path = join(dir, `round-${round}.sqlite`);
      const sequelize = await openDatabase(path);
      await migrateUp(sequelize);
      await sequelize.transaction(async (t) => {
        await sequelize.query("INSERT INTO users (id, email, name, password_hash, created_at, updated_at) VALUES (?, ?, 'n', 'x', datetime('now'), datetime('now'))", { replacements: [`u${round}`, `u${round}@example.test`], transaction: t });
      });
      expect(await readRow<{ n: number }>(sequelize, 'SELECT COUNT(*) AS n FROM users', [])).toEqual({ n: 1 });
      await sequelize.close();
      if (walLeft(path)) left.push(round);
    }
    expect(left).toEqual([]);
  });
});
