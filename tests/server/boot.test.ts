import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync, chmodSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { boot } from '../../server/boot';
import type { Running } from '../../server/boot';
import { ConfigError, readConfig } from '../../server/config';
import { createLogger } from '../../server/logger';
import { ENGINE_VERSION } from '../../src/engine';

const dir = mkdtempSync(join(tmpdir(), 'pp-boot-'));
let running: Running;
let base: string;

beforeAll(async () => {
  const config = readConfig({ NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: join(dir, 'db', 'test.sqlite') });
  running = await boot(config, createLogger('silent'));
  base = `http://127.0.0.1:${running.port}`;
});
afterAll(async () => running?.close());

describe('server start-up', () => {
  it('creates and migrates a new database file and reports ready on /api/health', async () => {
    const res = await fetch(`${base}/api/health`);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body).toMatchObject({ live: true, ready: true, engineVersion: ENGINE_VERSION, database: { ok: true, dialect: 'sqlite', journalMode: 'wal' } });
    expect(body.database.migrations.pending).toBe(0);
    expect(body.database.migrations.applied).toBeGreaterThan(0);
  });

  it('loads the demo only once, however often it starts', async () => {
    const counts = async () => {
      const out: Record<string, number> = {};
      for (const table of ['app_meta', 'users', 'workspaces', 'memberships', 'fixtures', 'scenarios', 'scenario_revisions']) {
        const [rows] = (await running.sequelize.query(`SELECT COUNT(*) AS n FROM ${table}`)) as [{ n: number }[], unknown];
        out[table] = Number(rows[0]!.n);
      }
      return out;
    };
    const before = await counts();
    await running.close();
    const config = readConfig({ NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: join(dir, 'db', 'test.sqlite') });
    running = await boot(config, createLogger('silent'));
    base = `http://127.0.0.1:${running.port}`;
    const [rows] = (await running.sequelize.query("SELECT COUNT(*) AS n FROM app_meta WHERE key = 'demo'")) as [{ n: number }[], unknown];
    expect(rows[0]!.n).toBe(1);
    // The second start adds nothing: the demo's four accounts, its workspace and scenarios are there once.
    expect(before.users).toBe(4);
    expect(before.scenarios).toBeGreaterThanOrEqual(2);
    expect(await counts()).toEqual(before);
  });

  it('serves the shipped example scenarios', async () => {
    const list = await (await fetch(`${base}/api/examples`)).json();
    expect(list.examples.map((e: { id: string }) => e.id)).toEqual(expect.arrayContaining(['room-a-relamp-or-replace', 'room-b-new-build']));
    const one = await fetch(`${base}/api/examples/room-b-new-build`);
    expect((await one.json()).scenario.target).toEqual({ dli: 17 });
  });

  it('answers an unknown API route with the one error shape', async () => {
    const res = await fetch(`${base}/api/no-such-thing`);
    expect(res.status).toBe(404);
    const body = await res.json();
    expect(body).toEqual({ error: { code: 'not_found', message: expect.any(String), fields: [], requestId: expect.any(String) } });
  });

  it('answers malformed JSON with 400 malformed_json, not a stack trace', async () => {
    const res = await fetch(`${base}/api/examples`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{"a":' });
    expect(res.status).toBe(400);
    const text = await res.text();
    expect(JSON.parse(text).error.code).toBe('malformed_json');
    expect(text).not.toMatch(/at .*\.ts:\d+/);
  });
});

describe('configuration', () => {
  it('refuses to start in production without a long AUTH_SECRET', () => {
    expect(() => readConfig({ NODE_ENV: 'production' })).toThrow(ConfigError);
    expect(() => readConfig({ NODE_ENV: 'production', AUTH_SECRET: 'x'.repeat(40) })).not.toThrow();
  });

  it('refuses a PORT that is not a port number', () => {
    expect(() => readConfig({ PORT: 'eighty' })).toThrow(/PORT must be a port number/);
  });

  it('fails start-up clearly when the database path cannot be written', async () => {
    const locked = join(dir, 'locked');
    writeFileSync(locked, 'a file, not a folder');
    chmodSync(locked, 0o444);
    const config = readConfig({ NODE_ENV: 'test', PORT: '0', DATABASE_PATH: join(locked, 'sub', 'x.sqlite') });
    await expect(boot(config, createLogger('silent'))).rejects.toThrow(/cannot be created or written .*DATABASE_PATH/);
  });

  it('checks the database path before building the client, so a bad one stops npm start at once', () => {
    const locked = join(dir, 'locked-for-start');
    writeFileSync(locked, 'a file, not a folder');
    // An empty folder as the working directory: had the client build run first, it would have
    // failed there on the missing index.html, with another message.
    const empty = mkdtempSync(join(tmpdir(), 'pp-no-client-'));
    const tsx = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href;
    const started = spawnSync(process.execPath, ['--import', tsx, resolve('server/index.ts')], {
      cwd: empty,
      env: { ...process.env, NODE_ENV: 'test', PORT: '0', DATABASE_PATH: join(locked, 'x.sqlite') },
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(started.status).toBe(1);
    expect(started.stderr).toMatch(/^Photon Parity cannot start: the database file .*x\.sqlite cannot be created or written \(\w+\); set DATABASE_PATH to a writable place\n$/);
  });
});
