import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '../../src/contracts/api/errors';
import type { Role } from '../../src/contracts/api/common';
import type { ApiClient } from '../helpers/api-client';
import { sampleScenario, seedInvitationFor, seedWorkspace } from '../helpers/seed';
import type { SeededWorkspace } from '../helpers/seed';
import { demoAccount, startTestApp, TEST_PASSWORD } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

type Actor = 'anonymous' | 'viewer' | 'editor' | 'owner' | 'outsider' | 'admin';
const ACTORS: Actor[] = ['anonymous', 'viewer', 'editor', 'owner', 'outsider', 'admin'];
/** Who may call a route: anyone, anyone signed in, a workspace role or better, or site admins. */
type Need = 'anyone' | 'signed-in' | Role | 'site-admin';

interface Case {
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  path: (w: SeededWorkspace) => string;
  need: Need;
  ok: number;
  body?: (w: SeededWorkspace, actor: Actor) => unknown;
  headers?: Record<string, string>;
  /** Per-actor preparation returning path overrides (e.g. an invitation addressed to this actor). */
  prepare?: (actor: Actor) => Promise<Partial<SeededWorkspace>>;
}

const RANK: Record<Role, number> = { viewer: 1, editor: 2, owner: 3 };

/** The status the product promises: 401 anonymous, 404 outside the workspace, 403 below the role. */
function expected(c: Case, actor: Actor): number {
  if (c.need === 'anyone') return c.ok;
  if (actor === 'anonymous') return 401;
  if (c.need === 'signed-in') return c.ok;
  if (c.need === 'site-admin') return actor === 'admin' ? c.ok : 403;
  if (actor === 'outsider' || actor === 'admin') return 404;
  return RANK[actor] >= RANK[c.need] ? c.ok : 403;
}

const ws = (w: SeededWorkspace) => `/api/workspaces/${w.workspaceId}`;
const sc = (w: SeededWorkspace) => `${ws(w)}/scenarios/${w.scenarioId}`;
const analysisSettings = {
  version: 1,
  sweep: { vary: 'a', tariffLo: '0', tariffHi: '1', tariffN: '10', factorLo: '0.5', factorHi: '1.5', factorN: '10', showValueOf: 'a' },
  swings: { pct: '20', measure: 'option', a: 'a', b: 'b' },
  breakeven: { a: 'a', b: 'b' },
  uncertainty: { seed: '42', draws: '100', inputs: [] },
};
const csv = 'key,label,technology,wallWatts,photonEfficacy,fixturePrice\nimported-led,Imported LED,led,320,2.7,410\n';

let app: TestApp;
const clients = new Map<Actor, ApiClient>();
const passwords = new Map<Actor, string>();
const emails = new Map<Actor, string>();

const CASES: Case[] = [
  { method: 'GET', path: () => '/api/health', need: 'anyone', ok: 200 },
  { method: 'GET', path: () => '/api/examples', need: 'anyone', ok: 200 },
  { method: 'GET', path: () => '/api/me', need: 'anyone', ok: 200 },
  { method: 'POST', path: () => '/api/account/sign-up', need: 'anyone', ok: 201, body: () => ({ email: `m-${randomUUID()}@example.org`, name: 'Matrix', password: TEST_PASSWORD }) },
  { method: 'POST', path: () => '/api/account/password', need: 'signed-in', ok: 200, body: (_w, a) => ({ currentPassword: passwords.get(a) ?? 'x', newPassword: passwords.get(a) ?? 'nobody-signed-in' }) },
  { method: 'GET', path: () => '/api/workspaces', need: 'signed-in', ok: 200 },
  { method: 'POST', path: () => '/api/workspaces', need: 'signed-in', ok: 201, body: () => ({ name: 'Matrix room', currency: 'EUR' }) },
  { method: 'GET', path: ws, need: 'viewer', ok: 200 },
  { method: 'PATCH', path: ws, need: 'owner', ok: 200, body: () => ({ name: 'Renamed' }) },
  { method: 'DELETE', path: ws, need: 'owner', ok: 204 },
  { method: 'GET', path: (w) => `${ws(w)}/members`, need: 'viewer', ok: 200 },
  { method: 'PATCH', path: (w) => `${ws(w)}/members/${w.extraMemberId}`, need: 'owner', ok: 200, body: () => ({ role: 'editor' }) },
  { method: 'DELETE', path: (w) => `${ws(w)}/members/${w.extraMemberId}`, need: 'owner', ok: 204 },
  { method: 'GET', path: (w) => `${ws(w)}/invitations`, need: 'owner', ok: 200 },
  { method: 'POST', path: (w) => `${ws(w)}/invitations`, need: 'owner', ok: 201, body: () => ({ email: `i-${randomUUID()}@example.org`, role: 'viewer' }) },
  { method: 'DELETE', path: (w) => `${ws(w)}/invitations/${w.invitationId}`, need: 'owner', ok: 204 },
  { method: 'GET', path: (w) => `/api/invitations/${w.invitationToken}`, need: 'anyone', ok: 200 },
  {
    method: 'POST',
    path: (w) => `/api/invitations/${w.invitationToken}/accept`,
    need: 'signed-in',
    ok: 200,
    prepare: async (actor) => ({ invitationToken: await seedInvitationFor(app.m, emails.get(actor) ?? 'nobody@example.org') }),
  },
  { method: 'GET', path: (w) => `${ws(w)}/fixtures`, need: 'viewer', ok: 200 },
  {
    method: 'POST',
    path: (w) => `${ws(w)}/fixtures`,
    need: 'editor',
    ok: 201,
    body: () => ({ key: 'matrix-led', label: 'Matrix LED', technology: 'led', wallWatts: 200, photonEfficacy: 2.5, fixturePrice: '300' }),
  },
  { method: 'GET', path: (w) => `${ws(w)}/fixtures/${w.fixtureId}`, need: 'viewer', ok: 200 },
  { method: 'PATCH', path: (w) => `${ws(w)}/fixtures/${w.fixtureId}`, need: 'editor', ok: 200, body: () => ({ label: 'Relabelled' }) },
  { method: 'DELETE', path: (w) => `${ws(w)}/fixtures/${w.fixtureId}`, need: 'editor', ok: 204 },
  { method: 'POST', path: (w) => `${ws(w)}/fixtures/import`, need: 'editor', ok: 200, body: () => csv, headers: { 'content-type': 'text/csv' } },
  { method: 'GET', path: (w) => `${ws(w)}/fixtures/export`, need: 'viewer', ok: 200 },
  { method: 'GET', path: (w) => `${ws(w)}/scenarios`, need: 'viewer', ok: 200 },
  { method: 'POST', path: (w) => `${ws(w)}/scenarios`, need: 'editor', ok: 201, body: () => ({ document: sampleScenario('Matrix scenario') }) },
  { method: 'GET', path: sc, need: 'viewer', ok: 200 },
  { method: 'PUT', path: sc, need: 'editor', ok: 200, body: () => ({ document: sampleScenario('Edited title') }), headers: { 'if-match': '1' } },
  { method: 'DELETE', path: sc, need: 'editor', ok: 204 },
  { method: 'GET', path: (w) => `${sc(w)}/revisions`, need: 'viewer', ok: 200 },
  { method: 'GET', path: (w) => `${sc(w)}/revisions/1`, need: 'viewer', ok: 200 },
  { method: 'POST', path: (w) => `${sc(w)}/revisions/1/restore`, need: 'editor', ok: 200 },
  { method: 'POST', path: (w) => `${sc(w)}/duplicate`, need: 'editor', ok: 201 },
  { method: 'GET', path: (w) => `${sc(w)}/result`, need: 'viewer', ok: 200 },
  { method: 'GET', path: (w) => `${sc(w)}/analysis`, need: 'viewer', ok: 200 },
  { method: 'PUT', path: (w) => `${sc(w)}/analysis`, need: 'editor', ok: 200, body: () => ({ settings: analysisSettings }) },
  { method: 'GET', path: (w) => `${sc(w)}/snapshots`, need: 'editor', ok: 200 },
  { method: 'POST', path: (w) => `${sc(w)}/snapshots`, need: 'editor', ok: 201, body: () => ({ notes: 'matrix' }) },
  { method: 'GET', path: (w) => `${ws(w)}/snapshots`, need: 'editor', ok: 200 },
  { method: 'GET', path: (w) => `${ws(w)}/measurements`, need: 'viewer', ok: 200 },
  { method: 'GET', path: () => '/api/admin/users', need: 'site-admin', ok: 200 },
  { method: 'PATCH', path: (w) => `/api/admin/users/${w.extraMemberId}`, need: 'site-admin', ok: 200, body: () => ({ name: 'Renamed By Admin' }) },
  { method: 'GET', path: () => '/api/admin/mail', need: 'site-admin', ok: 200 },
];

beforeAll(async () => {
  app = await startTestApp();
  clients.set('anonymous', app.client());
  for (const part of ['viewer', 'editor', 'owner', 'admin'] as const) {
    clients.set(part, await app.signInAs(part));
    passwords.set(part, demoAccount(part).password);
    emails.set(part, demoAccount(part).email);
  }
  const outsider = await app.signUpAndIn('outsider@example.org', 'Someone Elsewhere');
  expect((await outsider.post('/api/workspaces', { name: 'Another co-operative', currency: 'EUR' })).status).toBe(201);
  clients.set('outsider', outsider);
  passwords.set('outsider', TEST_PASSWORD);
  emails.set('outsider', 'outsider@example.org');
});
afterAll(async () => app?.close());

describe('roles on every API route', () => {
  const people = () => ['viewer', 'editor', 'owner'].map((role) => ({ email: demoAccount(role as Role).email, role: role as Role }));

  for (const c of CASES) {
    it(`${c.method} ${c.path({ workspaceId: ':wid', fixtureId: ':fid', scenarioId: ':sid', invitationId: ':iid', invitationToken: ':token', extraMemberId: ':uid' })} answers each role as promised`, async () => {
      const got: Record<string, number> = {};
      const want: Record<string, number> = {};
      for (const actor of ACTORS) {
        const seeded = { ...(await seedWorkspace(app.m, people())), ...(await c.prepare?.(actor)) };
        const client = clients.get(actor);
        if (!client) throw new Error(`no client for ${actor}`);
        const reply = await client.send(c.method, c.path(seeded), { body: c.body?.(seeded, actor), headers: c.headers });
        got[actor] = reply.status;
        want[actor] = expected(c, actor);
        expect(reply.status, `${actor}: ${reply.text.slice(0, 300)}`).not.toBe(500);
        if (reply.status >= 400) errorBodySchema.parse(reply.body);
      }
      expect(got).toEqual(want);
    });
  }
});
