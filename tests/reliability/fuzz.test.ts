import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FIXTURE_CSV_COLUMNS } from '../../src/contracts/api/fixtures';
import type { ApiClient } from '../helpers/api-client';
import { sampleScenario } from '../helpers/seed';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { addMember } from '../../server/repos/members';
import { insertUser } from '../../server/repos/users';
import { csvBodies, jsonBodies } from './fuzz-bodies';
import type { FuzzBody } from './fuzz-bodies';

setFlagsFromString('--expose-gc');
const gc = runInNewContext('gc') as () => void;

const RUNS = Number(process.env.FUZZ_RUNS ?? 25);
let app: TestApp;
let owner: ApiClient;
let ids: { wid: string; sid: string; fid: string; snap: string; uid: string };
let countsSql: string;

interface WriteRoute {
  method: 'POST' | 'PUT' | 'PATCH';
  path: () => string;
  /** Built when the test runs, once the ids exist. */
  bodies: () => fc.Arbitrary<FuzzBody>;
  headers?: Record<string, string>;
  anonymous?: boolean;
}

const valid = {
  scenario: () => ({ document: sampleScenario('Fuzzed') }),
  fixture: { key: 'fuzz-led', label: 'Fuzz LED', technology: 'led', wallWatts: 300, photonEfficacy: 2.5, fixturePrice: '300' },
};

const routes = (): Record<string, WriteRoute> => {
  const ws = () => `/api/workspaces/${ids.wid}`;
  return {
    'POST /api/account/sign-up': { method: 'POST', path: () => '/api/account/sign-up', bodies: () => jsonBodies({ email: 'fuzz@example.org', name: 'Fuzz', password: 'a-long-enough-password' }), anonymous: true },
    'POST /api/account/password': { method: 'POST', path: () => '/api/account/password', bodies: () => jsonBodies({ currentPassword: 'wrong-password-here', newPassword: 'another-long-password' }) },
    'POST /api/workspaces': { method: 'POST', path: () => '/api/workspaces', bodies: () => jsonBodies({ name: 'Fuzz room', currency: 'EUR', unitSystem: 'si' }) },
    'PATCH /api/workspaces/:wid': { method: 'PATCH', path: ws, bodies: () => jsonBodies({ name: 'Renamed', currency: 'EUR' }) },
    'PATCH …/members/:uid': { method: 'PATCH', path: () => `${ws()}/members/${ids.uid}`, bodies: () => jsonBodies({ role: 'editor' }) },
    'POST …/invitations': { method: 'POST', path: () => `${ws()}/invitations`, bodies: () => jsonBodies({ email: 'invitee@example.org', role: 'viewer' }) },
    'POST /api/invitations/:token/accept': { method: 'POST', path: () => '/api/invitations/not-a-real-token/accept', bodies: () => jsonBodies({}) },
    'POST …/fixtures': { method: 'POST', path: () => `${ws()}/fixtures`, bodies: () => jsonBodies(valid.fixture) },
    'PATCH …/fixtures/:fid': { method: 'PATCH', path: () => `${ws()}/fixtures/${ids.fid}`, bodies: () => jsonBodies({ label: 'Relabelled', wallWatts: 310 }) },
    'POST …/fixtures/import (CSV)': { method: 'POST', path: () => `${ws()}/fixtures/import`, bodies: () => csvBodies(FIXTURE_CSV_COLUMNS.join(',')) },
    'POST …/scenarios': { method: 'POST', path: () => `${ws()}/scenarios`, bodies: () => jsonBodies(valid.scenario()) },
    'PUT …/scenarios/:sid': { method: 'PUT', path: () => `${ws()}/scenarios/${ids.sid}`, bodies: () => jsonBodies(valid.scenario()), headers: { 'if-match': '1' } },
    'POST …/scenarios/:sid/duplicate': { method: 'POST', path: () => `${ws()}/scenarios/${ids.sid}/duplicate`, bodies: () => jsonBodies({ title: 'Copy' }) },
    'POST …/revisions/1/restore': { method: 'POST', path: () => `${ws()}/scenarios/${ids.sid}/revisions/1/restore`, bodies: () => jsonBodies({}) },
    'POST …/scenarios/:sid/snapshots': { method: 'POST', path: () => `${ws()}/scenarios/${ids.sid}/snapshots`, bodies: () => jsonBodies({ notes: 'n', expiresAt: null }) },
    'PATCH …/snapshots/:id': { method: 'PATCH', path: () => `${ws()}/snapshots/${ids.snap}`, bodies: () => jsonBodies({ expiresAt: null }) },
    'POST /api/snapshots/:id/fork': { method: 'POST', path: () => `/api/snapshots/${ids.snap}/fork`, bodies: () => jsonBodies({ workspaceId: ids.wid, title: 'Forked' }) },
    'POST …/snapshots/:id/send': { method: 'POST', path: () => `${ws()}/snapshots/${ids.snap}/send`, bodies: () => jsonBodies({ to: ['reader@example.org'], note: 'hi' }) },
    'POST …/measurements (upload)': { method: 'POST', path: () => `${ws()}/measurements`, bodies: () => csvBodies('x_m,y_m,ppfd') },
    'PATCH /api/admin/users/:uid': { method: 'PATCH', path: () => `/api/admin/users/${ids.uid}`, bodies: () => jsonBodies({ name: 'Renamed By Admin' }) },
  };
};

/** Sends raw bytes as the signed-in owner (cookie and CSRF token); the measurement upload goes as multipart. */
async function sendRaw(route: WriteRoute, body: FuzzBody): Promise<{ status: number; text: string }> {
  const headers: Record<string, string> = { ...route.headers, 'x-csrf-token': owner.csrfToken ?? '' };
  if (!route.anonymous) headers.cookie = owner.jar.header() ?? '';
  let payload: BodyInit;
  if (route.path().endsWith('/measurements')) {
    const form = new FormData();
    form.append('kind', 'grid');
    form.append('file', new Blob([body.bytes as Uint8Array<ArrayBuffer>], { type: body.contentType }), 'fuzz.csv');
    payload = form;
  } else {
    headers['content-type'] = body.contentType;
    payload = body.bytes as Uint8Array<ArrayBuffer>;
  }
  const res = await fetch(`${app.base}${route.path()}`, { method: route.method, headers, body: payload });
  return { status: res.status, text: await res.text() };
}

async function rowCounts(): Promise<Record<string, number>> {
  const [row] = await app.running.sequelize.query<Record<string, number>>(countsSql, { type: QueryTypes.SELECT });
  return row ?? {};
}

function heapAfterGc(): number {
  for (let i = 0; i < 3; i++) gc();
  return process.memoryUsage().heapUsed;
}

beforeAll(async () => {
  app = await startTestApp();
  owner = await app.signInAs('admin');
  const ws = await owner.post('/api/workspaces', { name: 'Fuzz', currency: 'EUR' });
  const wid = ws.body.workspace.id as string;
  const sid = (await owner.post(`/api/workspaces/${wid}/scenarios`, valid.scenario())).body.scenario.id as string;
  const fid = (await owner.post(`/api/workspaces/${wid}/fixtures`, valid.fixture)).body.fixture.id as string;
  const snap = await owner.post(`/api/workspaces/${wid}/scenarios/${sid}/snapshots`, {});
  const member = await insertUser(app.m, { email: 'fuzz-member@example.org', name: 'Fuzz Member', passwordHash: null });
  await addMember(app.m, wid, member.id, 'viewer');
  const uid = member.id;
  ids = { wid, sid, fid, snap: snap.body.snapshot.id as string, uid };
  const tables = await app.running.sequelize.query<{ name: string }>("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name", { type: QueryTypes.SELECT });
  countsSql = `SELECT ${tables.map(({ name }) => `(SELECT COUNT(*) FROM "${name}") AS "${name}"`).join(', ')}`;
}, 240_000);
afterAll(async () => app?.close());

describe('generated bad input on every write route', () => {
  const problems: string[] = [];
  let baseline = 0;

  it('warms up and records the heap baseline', async () => {
    const warm = routes()['POST …/scenarios']!;
    await fc.assert(fc.asyncProperty(warm.bodies(), async (b) => (await sendRaw(warm, b)).status < 500), { numRuns: 20 });
    baseline = heapAfterGc();
    expect(baseline).toBeGreaterThan(0);
  });

  for (const name of Object.keys(routes())) {
    it(`${name}: never answers 5xx, and a refused request changes no row`, { timeout: 180_000 }, async () => {
      const route = routes()[name]!;
      await fc.assert(
        fc.asyncProperty(route.bodies(), async (body) => {
          const before = await rowCounts();
          const reply = await sendRaw(route, body);
          if (reply.status >= 500) problems.push(`${name} ${body.what}: ${reply.status} ${reply.text.slice(0, 200)}`);
          expect(reply.status, `${body.what}: ${reply.text.slice(0, 300)}`).toBeLessThan(500);
          if (reply.status >= 400) expect(await rowCounts(), body.what).toEqual(before);
        }),
        { numRuns: RUNS },
      );
      expect((await fetch(`${app.base}/api/health/live`)).status).toBe(200);
    });
  }

  it('stays up, and the heap returns near its baseline once the garbage is collected', async () => {
    expect(problems).toEqual([]);
    expect((await fetch(`${app.base}/api/health`)).status).toBe(200);
    const after = heapAfterGc();
    // Tolerance: 40 MB over the baseline, room for caches filled on first use (compiled schemas, LRU of snapshots).
    expect(after - baseline).toBeLessThan(40 * 1024 * 1024);
  });
});
