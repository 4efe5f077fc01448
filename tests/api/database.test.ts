import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { boot } from '../../server/boot';
import type { Running } from '../../server/boot';
import { readConfig } from '../../server/config';
import { migrations } from '../../server/db/migrations';
import { createLogger } from '../../server/logger';
import { ApiClient } from '../helpers/api-client';
import { sampleScenario } from '../helpers/seed';
import { startTestApp, TEST_PASSWORD } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { onPostgres } from '../helpers/test-database';

let app: TestApp;
let second: Running | undefined;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => {
  await second?.close();
  await app?.close();
});

describe('the database in use', () => {
  it(`is ${onPostgres ? 'PostgreSQL (TEST_DATABASE_URL is set)' : 'the SQLite file'}, and /api/health says so with every migration applied`, async () => {
    expect(app.running.sequelize.getDialect()).toBe(onPostgres ? 'postgres' : 'sqlite');
    const health = await app.client().get('/api/health');
    expect(health.status).toBe(200);
    expect(health.body.database).toMatchObject({
      ok: true,
      dialect: onPostgres ? 'postgres' : 'sqlite',
      migrations: { applied: migrations.length, pending: 0 },
    });
  });

  it('keeps booleans, dates, decimal text and counts the same shape whichever database stores them', async () => {
    const owner = await app.signInAs('owner');
    const wid = (await owner.get('/api/me')).body.memberships[0].workspaceId as string;
    const made = await owner.post(`/api/workspaces/${wid}/fixtures`, {
      key: 'round-trip',
      label: 'Round trip',
      technology: 'led',
      wallWatts: 312.5,
      photonEfficacy: 2.75,
      owned: true,
      fixturePrice: '1234.5678',
    });
    expect(made.status).toBe(201);
    const read = (await owner.get(`/api/workspaces/${wid}/fixtures`)).body.fixtures.find((f: { key: string }) => f.key === 'round-trip');
    expect(read).toMatchObject({ owned: true, wallWatts: 312.5, photonEfficacy: 2.75, fixturePrice: '1234.5678' });
    expect(read.updatedAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/);
    const workspaces = (await owner.get('/api/workspaces')).body.workspaces;
    expect(typeof workspaces[0].memberCount).toBe('number');
  });
});

describe('two app instances on one database', () => {
  beforeAll(async () => {
    second = await boot(readConfig({ NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', ...app.databaseEnv }), createLogger('silent'));
  });

  it('accept each other’s sessions and CSRF tokens and see each other’s saves at once (no sticky sessions needed)', async () => {
    const other = new ApiClient(`http://127.0.0.1:${second!.port}`);
    const first = await app.signUpAndIn('two-instances@example.org', 'Two Instances', TEST_PASSWORD);
    const wid = (await first.post('/api/workspaces', { name: 'Shared', currency: 'EUR' })).body.workspace.id as string;
    const sid = (await first.post(`/api/workspaces/${wid}/scenarios`, { document: sampleScenario('Saved on the first') })).body.scenario.id as string;

    for (const c of first.jar.header()?.split('; ') ?? []) other.jar.set(c.slice(0, c.indexOf('=')), c.slice(c.indexOf('=') + 1));
    expect((await other.get('/api/me')).body.user.email).toBe('two-instances@example.org');
    const read = await other.get(`/api/workspaces/${wid}/scenarios/${sid}`);
    expect(read.status).toBe(200);
    expect(read.body.scenario.title).toBe('Saved on the first');
    // The CSRF token is an HMAC under AUTH_SECRET, so the one the first instance gave works on the second.
    other.csrfToken = first.csrfToken;
    const made = await other.post(`/api/workspaces/${wid}/scenarios`, { document: sampleScenario('Saved on the second') });
    expect(made.status).toBe(201);
    expect((await first.get(`/api/workspaces/${wid}/scenarios/${made.body.scenario.id}`)).body.scenario.title).toBe('Saved on the second');
  });

  it('let exactly one of two racing sign-ups with the same e-mail through; the other is a 409, never a 5xx', async () => {
    const base = `http://127.0.0.1:${second!.port}`;
    const racers = [app.client(), app.client(), new ApiClient(base), new ApiClient(base)];
    const replies = await Promise.all(racers.map((c) => c.post('/api/account/sign-up', { email: 'racing@example.org', name: 'Racer', password: TEST_PASSWORD })));
    expect(replies.map((r) => r.status).sort()).toEqual([201, 409, 409, 409]);
    for (const r of replies.filter((x) => x.status === 409)) expect(r.body.error.code).toBe('conflict');
  });
});
