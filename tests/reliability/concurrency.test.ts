import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sqlite3 from 'sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiClient } from '../helpers/api-client';
import { sampleScenario } from '../helpers/seed';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { onPostgres } from '../helpers/test-database';
import { openDatabase } from '../../server/db/connection';
import { migrateUp } from '../../server/db/migrate';
import { isBusyError, retryWhenBusy } from '../../server/db/write-queue';

let app: TestApp;
let owner: ApiClient;
let editor: ApiClient;
let wid: string;

beforeAll(async () => {
  app = await startTestApp();
  owner = await app.signInAs('owner');
  editor = await app.signInAs('editor');
  const me = await owner.get('/api/me');
  wid = me.body.memberships.find((m: { role: string }) => m.role === 'owner').workspaceId;
});
afterAll(async () => app?.close());

const scenarios = () => `/api/workspaces/${wid}/scenarios`;
const statuses = (replies: Array<{ status: number }>) => replies.map((r) => r.status);

describe('concurrent writes', () => {
  it('answers 300 mixed concurrent writes without a single 5xx', { timeout: 120_000 }, async () => {
    const made = await Promise.all(Array.from({ length: 20 }, (_, i) => owner.post(scenarios(), { document: sampleScenario(`base ${i}`) })));
    const ids = made.map((r) => r.body.scenario.id as string);
    const writes = Array.from({ length: 300 }, (_, i) => {
      const who = i % 2 ? owner : editor;
      switch (i % 5) {
        case 0: return who.post(scenarios(), { document: sampleScenario(`concurrent ${i}`) });
        case 1: return who.put(`${scenarios()}/${ids[i % 20]}`, { document: sampleScenario(`edit ${i}`) }, { headers: { 'if-match': '1' } });
        case 2: return who.post(`${scenarios()}/${ids[i % 20]}/duplicate`, {});
        case 3: return who.post(`/api/workspaces/${wid}/fixtures`, { key: `k-${i}`, label: `Fixture ${i}`, technology: 'led', wallWatts: 300, photonEfficacy: 2.5, fixturePrice: '300' });
        default: return who.post(`${scenarios()}/${ids[i % 20]}/revisions/1/restore`);
      }
    });
    const replies = await Promise.all(writes);
    const failed = replies.filter((r) => r.status >= 500).map((r) => `${r.status} ${r.text}`);
    expect(failed).toEqual([]);
    // Many edits start from revision 1 of the same 20 scenarios, so most are refused as stale; none is lost silently.
    expect(statuses(replies).every((s) => [200, 201, 409].includes(s))).toBe(true);
  });

  it('lets exactly one of two editors saving from the same revision win; the other gets 409 with the current revision', { timeout: 60_000 }, async () => {
    const made = await Promise.all(Array.from({ length: 15 }, (_, i) => owner.post(scenarios(), { document: sampleScenario(`pair ${i}`) })));
    const results = await Promise.all(
      made.map(async (r) => {
        const id = r.body.scenario.id as string;
        const pair = await Promise.all([
          owner.put(`${scenarios()}/${id}`, { document: sampleScenario(`owner's title`) }, { headers: { 'if-match': '1' } }),
          editor.put(`${scenarios()}/${id}`, { document: sampleScenario(`editor's title`) }, { headers: { 'if-match': '1' } }),
        ]);
        const stored = await owner.get(`${scenarios()}/${id}`);
        return { pair, stored };
      }),
    );
    for (const { pair, stored } of results) {
      expect(statuses(pair).sort()).toEqual([200, 409]);
      const winner = pair.find((p) => p.status === 200)!;
      const loser = pair.find((p) => p.status === 409)!;
      expect(loser.body.error).toMatchObject({ code: 'conflict', fields: [{ path: 'revision', message: 'current revision is 2' }] });
      expect(stored.body.scenario.revision).toBe(2);
      expect(stored.body.scenario.title).toBe(winner.body.scenario.title);
    }
  });

  // SQLite only: it opens the SQLite file itself to hold its one write lock; PostgreSQL locks rows.
  it.skipIf(onPostgres)('waits out a write lock held by another process instead of failing the save', { timeout: 60_000 }, async () => {
    const other = await new Promise<sqlite3.Database>((resolve, reject) => {
      const db = new sqlite3.Database(app.databasePath, (e) => (e ? reject(e) : resolve(db)));
    });
    const run = (sql: string) => new Promise<void>((resolve, reject) => other.exec(sql, (e) => (e ? reject(e) : resolve())));
    await run('BEGIN IMMEDIATE');
    const saves = Promise.all(Array.from({ length: 30 }, (_, i) => owner.post(scenarios(), { document: sampleScenario(`behind a lock ${i}`) })));
    await new Promise((resolve) => setTimeout(resolve, 1500));
    await run('COMMIT');
    await new Promise<void>((resolve) => other.close(() => resolve()));
    expect(statuses(await saves)).toEqual(Array(30).fill(201));
  });
});

describe('retryWhenBusy', () => {
  it('tries a busy transaction again and returns its result', async () => {
    let calls = 0;
    const busy = Object.assign(new Error('SQLITE_BUSY: database is locked'), { code: 'SQLITE_BUSY' });
    const result = await retryWhenBusy(async () => {
      calls += 1;
      if (calls < 3) throw { name: 'SequelizeTimeoutError', parent: busy };
      return 'saved';
    }, { attempts: 5, firstDelayMs: 1, maxDelayMs: 5 });
    expect({ result, calls }).toEqual({ result: 'saved', calls: 3 });
  });

  it('does not retry other errors, and gives up after the last attempt', async () => {
    let calls = 0;
    await expect(retryWhenBusy(async () => { calls += 1; throw new Error('constraint failed'); })).rejects.toThrow('constraint failed');
    expect(calls).toBe(1);
    calls = 0;
    await expect(retryWhenBusy(async () => { calls += 1; throw { code: 'SQLITE_LOCKED' }; }, { attempts: 3, firstDelayMs: 1, maxDelayMs: 1 })).rejects.toEqual({ code: 'SQLITE_LOCKED' });
    expect(calls).toBe(3);
    expect(isBusyError(new Error('SQLITE_BUSY: database is locked'))).toBe(true);
  });
});

describe('the write queue', () => {
  it('lets every queued transaction commit before the database closes', async () => {
    const path = join(mkdtempSync(join(tmpdir(), 'pp-queue-')), 'queue.sqlite');
    const db = await openDatabase(path);
    await migrateUp(db);
    const writes = Array.from({ length: 40 }, (_, i) =>
      db.transaction(async (transaction) => {
        await db.query("INSERT INTO app_meta (key, value, updated_at) VALUES (?, 'v', 'now')", { replacements: [`queued-${i}`], transaction });
      }),
    );
    await db.close();
    await Promise.all(writes);
    const again = await openDatabase(path);
    const [rows] = (await again.query("SELECT COUNT(*) AS n FROM app_meta WHERE key LIKE 'queued-%'")) as [Array<{ n: number }>, unknown];
    await again.close();
    expect(rows[0]!.n).toBe(40);
  });
});
