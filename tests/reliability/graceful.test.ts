import { existsSync, mkdtempSync, statSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import express from 'express';
import { afterAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/connection';
import { migrateUp } from '../../server/db/migrate';
import { healthRouter } from '../../server/routes/health';
import { ApiClient } from '../helpers/api-client';
import { sampleScenario } from '../helpers/seed';
import { demoAccount } from '../helpers/test-app';
import { startChildServer } from './child-server';
import type { ChildServer } from './child-server';

const dir = mkdtempSync(join(tmpdir(), 'pp-graceful-'));
let server: ChildServer | undefined;

afterAll(() => {
  server?.process.kill('SIGKILL');
});

describe('shutting down on SIGTERM', () => {
  it('answers every request already in flight (closing each connection), closes the database and exits 0', { timeout: 180_000 }, async () => {
    const databasePath = join(dir, 'graceful.sqlite');
    server = await startChildServer(databasePath);
    const c = new ApiClient(server.base);
    const owner = demoAccount('owner');
    await c.signIn(owner.email, owner.password);
    const wid = (await c.get('/api/me')).body.memberships.find((m: { role: string }) => m.role === 'owner').workspaceId as string;
    const path = `/api/workspaces/${wid}/scenarios`;
    await c.refreshCsrf();

    // Each request sends its headers with Expect: 100-continue; the server's "100 Continue" proves it
    // holds the request. The signal comes then, and each body only after it.
    const bodies = Array.from({ length: 80 }, (_, i) => JSON.stringify({ document: sampleScenario(`in flight ${i}`) }));
    const headers = { cookie: c.jar.header() ?? '', 'x-csrf-token': c.csrfToken ?? '', 'content-type': 'application/json', expect: '100-continue' };
    const started = bodies.map((body) => {
      const req = request(`${server!.base}${path}`, { method: 'POST', headers: { ...headers, 'content-length': Buffer.byteLength(body) } });
      const answered = new Promise<number | string>((resolve) => {
        req.on('response', (res) => {
          res.resume();
          // After the signal every answer closes its connection, so keep-alive clients go elsewhere.
          res.on('end', () => resolve(res.headers.connection === 'close' ? (res.statusCode ?? 0) : `kept alive: ${res.statusCode}`));
        });
        req.on('error', (e) => resolve(`failed: ${e.message}`));
      });
      const held = new Promise<void>((resolve) => req.once('continue', () => resolve()));
      req.flushHeaders();
      return { req, body, answered, held };
    });
    await Promise.all(started.map((s) => s.held));
    await new Promise((resolve) => setTimeout(resolve, 500));
    server.process.kill('SIGTERM');
    await new Promise((resolve) => setTimeout(resolve, 500));
    const fresh = await fetch(`${server.base}/api/health/live`).then((r) => r.status, () => 'refused');
    for (const s of started) s.req.end(s.body);
    const statuses = await Promise.all(started.map((s) => s.answered));
    expect(await server.exited).toBe(0);

    expect(statuses.filter((s) => s !== 201)).toEqual([]);
    expect(fresh, 'a new connection after the signal is refused').toBe('refused');
    expect(server.output.some((l) => l.includes('shutting down'))).toBe(true);
    // SQLite removes the write-ahead log when the last connection closes cleanly.
    expect(!existsSync(`${databasePath}-wal`) || statSync(`${databasePath}-wal`).size === 0).toBe(true);

    const db = await openDatabase(databasePath);
    const [rows] = (await db.query("SELECT COUNT(*) AS n FROM scenarios WHERE title LIKE 'in flight %'")) as [Array<{ n: number }>, unknown];
    await db.close();
    expect(rows[0]!.n).toBe(bodies.length);
  });
});

describe('npm start', () => {
  // npm passes SIGTERM to the script's process only; a shell or launcher between them would die
  // and leave the server running on its port with nobody to stop it.
  it('hands SIGTERM on to the server, which shuts down and frees its port', { timeout: 120_000 }, async () => {
    const started = await startChildServer(join(dir, 'npm-start.sqlite'), {}, 90_000, ['npm', 'start', '--silent']);
    server = started;
    expect((await fetch(`${started.base}/api/health/live`)).status).toBe(200);
    started.process.kill('SIGTERM');
    expect(await started.exited).toBe(0);
    expect(started.output.some((l) => l.includes('"signal":"SIGTERM"') && l.includes('shutting down'))).toBe(true);
    const after = await fetch(`${started.base}/api/health/live`).then((r) => r.status, () => 'refused');
    expect(after, 'nothing answers on the port once npm has exited').toBe('refused');
  });
});

describe('/api/health', () => {
  it('reports liveness and readiness apart: live while the process answers, ready only while the database does', async () => {
    const sequelize = await openDatabase(join(dir, 'health.sqlite'));
    await migrateUp(sequelize);
    const app = express().use('/api/health', healthRouter({ sequelize }));
    const listening = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => listening.once('listening', resolve));
    const address = listening.address();
    const base = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}/api/health`;
    try {
      expect(await (await fetch(`${base}/live`)).json()).toEqual({ live: true });
      const ready = await fetch(`${base}/ready`);
      expect(ready.status).toBe(200);
      expect(await ready.json()).toMatchObject({ ready: true, database: { ok: true, dialect: 'sqlite', journalMode: 'wal', migrations: { pending: 0 } } });

      await sequelize.close();
      expect((await fetch(`${base}/live`)).status).toBe(200);
      const notReady = await fetch(`${base}/ready`);
      expect(notReady.status).toBe(503);
      expect(await notReady.json()).toMatchObject({ ready: false, database: { ok: false } });
      expect((await fetch(base)).status).toBe(503);
    } finally {
      listening.close();
    }
  });
});
