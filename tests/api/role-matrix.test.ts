import { randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '../../src/contracts/api/errors';
import type { Role } from '../../src/contracts/api/common';
import type { ApiClient, ApiReply } from '../helpers/api-client';
import { NOT_API, OUTSIDE_ROUTER, answeredOutsideRouter, appRoutes, fillRoute as fill } from '../helpers/route-list';
import type { RouteKey } from '../helpers/route-list';
import { sampleScenario, seedInvitationFor, seedWorkspace } from '../helpers/seed';
import { demoAccount, startTestApp, TEST_PASSWORD } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { GRID_3X3, upload } from '../measurements/uploads';

type Actor = 'anonymous' | 'viewer' | 'editor' | 'owner' | 'outsider' | 'admin';
const ACTORS: Actor[] = ['anonymous', 'viewer', 'editor', 'owner', 'outsider', 'admin'];
/** Who may call a route: anyone, anyone signed in, a workspace role or better, or site admins. */
type Need = 'anyone' | 'signed-in' | Role | 'site-admin';
/** The values a route's `:param`s take for one actor: a fresh workspace and what is in it. */
type Params = Record<string, string>;

interface Case {
  route: RouteKey;
  need: Need;
  /** The success status; a function when it depends on the machine, read right after the reply. */
  ok: number | (() => number);
  body?: (p: Params, actor: Actor) => unknown;
  headers?: Record<string, string>;
  /** Per-actor preparation returning parameter overrides (e.g. an invitation addressed to this actor). */
  prepare?: (actor: Actor) => Promise<Params>;
  /** Sends the request itself, for bodies ApiClient does not build (multipart, Auth.js forms). */
  send?: (client: ApiClient, path: string, p: Params) => Promise<ApiReply>;
}

const RANK: Record<Role, number> = { viewer: 1, editor: 2, owner: 3 };

/** The status the product promises: 401 anonymous, 404 outside the workspace, 403 below the role. */
function expected(c: Case, actor: Actor): number {
  const ok = typeof c.ok === 'number' ? c.ok : c.ok();
  if (c.need === 'anyone') return ok;
  if (actor === 'anonymous') return 401;
  if (c.need === 'signed-in') return ok;
  if (c.need === 'site-admin') return actor === 'admin' ? ok : 403;
  if (actor === 'outsider' || actor === 'admin') return 404;
  return RANK[actor] >= RANK[c.need] ? ok : 403;
}

const analysisSettings = {
  version: 1,
  sweep: { vary: 'a', tariffLo: '0', tariffHi: '1', tariffN: '10', factorLo: '0.5', factorHi: '1.5', factorN: '10', showValueOf: 'a' },
  swings: { pct: '20', measure: 'option', a: 'a', b: 'b' },
  breakeven: { a: 'a', b: 'b' },
  uncertainty: { seed: '42', draws: '100', inputs: [] },
};
const csv = 'key,label,technology,wallWatts,photonEfficacy,fixturePrice\nimported-led,Imported LED,led,320,2.7,410\n';
/** The web app's page for a live link is dist/index.html; without a built client (or while a build rewrites dist) the request falls through to 404. */
const clientBuilt = () => existsSync(join(process.cwd(), 'dist', 'index.html'));
const inADay = () => new Date(Date.now() + 86_400_000).toISOString();

let app: TestApp;
let exampleId = '';
const clients = new Map<Actor, ApiClient>();
const passwords = new Map<Actor, string>();
const emails = new Map<Actor, string>();

/** An Auth.js form post with the client's Auth.js CSRF token, as the web client sends it. */
async function authForm(client: ApiClient, path: string, fields: Record<string, string>): Promise<ApiReply> {
  const csrfToken = await client.authCsrf();
  return client.send('POST', path, {
    body: new URLSearchParams({ ...fields, csrfToken, callbackUrl: '/' }).toString(),
    headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-auth-return-redirect': '1' },
  });
}

const CASES: Case[] = [
  { route: 'GET /api/health', need: 'anyone', ok: 200 },
  { route: 'GET /api/health/live', need: 'anyone', ok: 200 },
  { route: 'GET /api/health/ready', need: 'anyone', ok: 200 },
  { route: 'GET /api/examples', need: 'anyone', ok: 200 },
  { route: 'GET /api/examples/:id', need: 'anyone', ok: 200, prepare: async () => ({ id: exampleId }) },
  { route: 'GET /api/me', need: 'anyone', ok: 200 },
  { route: 'POST /api/account/sign-up', need: 'anyone', ok: 201, body: () => ({ email: `m-${randomUUID()}@example.org`, name: 'Matrix', password: TEST_PASSWORD }) },
  { route: 'POST /api/account/password', need: 'signed-in', ok: 200, body: (_p, a) => ({ currentPassword: passwords.get(a) ?? 'x', newPassword: passwords.get(a) ?? 'nobody-signed-in' }) },
  // A refused sign-in: Auth.js answers 200 with an error URL, and the caller's own session stays.
  { route: 'POST /auth/callback/credentials', need: 'anyone', ok: 200, send: (c, path) => authForm(c, path, { email: `nobody-${randomUUID()}@example.org`, password: 'not-the-password' }) },
  { route: 'POST /auth/signin/nodemailer', need: 'anyone', ok: 200, send: (c, path) => authForm(c, path, { email: `link-${randomUUID()}@example.org` }) },
  { route: 'GET /api/workspaces', need: 'signed-in', ok: 200 },
  { route: 'POST /api/workspaces', need: 'signed-in', ok: 201, body: () => ({ name: 'Matrix room', currency: 'EUR' }) },
  { route: 'GET /api/workspaces/:wid', need: 'viewer', ok: 200 },
  { route: 'PATCH /api/workspaces/:wid', need: 'owner', ok: 200, body: () => ({ name: 'Renamed' }) },
  { route: 'DELETE /api/workspaces/:wid', need: 'owner', ok: 204 },
  { route: 'GET /api/workspaces/:wid/members', need: 'viewer', ok: 200 },
  { route: 'PATCH /api/workspaces/:wid/members/:userId', need: 'owner', ok: 200, body: () => ({ role: 'editor' }) },
  // Removing someone else; a member leaving (the same route on one's own id) has its own test below.
  { route: 'DELETE /api/workspaces/:wid/members/:userId', need: 'owner', ok: 204 },
  { route: 'GET /api/workspaces/:wid/invitations', need: 'owner', ok: 200 },
  { route: 'POST /api/workspaces/:wid/invitations', need: 'owner', ok: 201, body: () => ({ email: `i-${randomUUID()}@example.org`, role: 'viewer' }) },
  { route: 'DELETE /api/workspaces/:wid/invitations/:iid', need: 'owner', ok: 204 },
  { route: 'GET /api/invitations/:token', need: 'anyone', ok: 200 },
  {
    route: 'POST /api/invitations/:token/accept',
    need: 'signed-in',
    ok: 200,
    prepare: async (actor) => ({ token: await seedInvitationFor(app.m, emails.get(actor) ?? 'nobody@example.org') }),
  },
  { route: 'GET /api/workspaces/:wid/fixtures', need: 'viewer', ok: 200 },
  {
    route: 'POST /api/workspaces/:wid/fixtures',
    need: 'editor',
    ok: 201,
    body: () => ({ key: 'matrix-led', label: 'Matrix LED', technology: 'led', wallWatts: 200, photonEfficacy: 2.5, fixturePrice: '300' }),
  },
  { route: 'GET /api/workspaces/:wid/fixtures/:fid', need: 'viewer', ok: 200 },
  { route: 'PATCH /api/workspaces/:wid/fixtures/:fid', need: 'editor', ok: 200, body: () => ({ label: 'Relabelled' }) },
  { route: 'DELETE /api/workspaces/:wid/fixtures/:fid', need: 'owner', ok: 204 },
  { route: 'POST /api/workspaces/:wid/fixtures/import', need: 'editor', ok: 200, body: () => csv, headers: { 'content-type': 'text/csv' } },
  { route: 'GET /api/workspaces/:wid/fixtures/export', need: 'viewer', ok: 200 },
  { route: 'GET /api/workspaces/:wid/scenarios', need: 'viewer', ok: 200 },
  { route: 'POST /api/workspaces/:wid/scenarios', need: 'editor', ok: 201, body: () => ({ document: sampleScenario('Matrix scenario') }) },
  { route: 'GET /api/workspaces/:wid/scenarios/:sid', need: 'viewer', ok: 200 },
  { route: 'PUT /api/workspaces/:wid/scenarios/:sid', need: 'editor', ok: 200, body: () => ({ document: sampleScenario('Edited title') }), headers: { 'if-match': '1' } },
  { route: 'DELETE /api/workspaces/:wid/scenarios/:sid', need: 'owner', ok: 204 },
  { route: 'GET /api/workspaces/:wid/scenarios/:sid/revisions', need: 'viewer', ok: 200 },
  { route: 'GET /api/workspaces/:wid/scenarios/:sid/revisions/:rev', need: 'viewer', ok: 200 },
  { route: 'POST /api/workspaces/:wid/scenarios/:sid/revisions/:rev/restore', need: 'editor', ok: 200 },
  { route: 'POST /api/workspaces/:wid/scenarios/:sid/duplicate', need: 'editor', ok: 201 },
  { route: 'GET /api/workspaces/:wid/scenarios/:sid/result', need: 'viewer', ok: 200 },
  { route: 'GET /api/workspaces/:wid/scenarios/:sid/analysis', need: 'viewer', ok: 200 },
  { route: 'PUT /api/workspaces/:wid/scenarios/:sid/analysis', need: 'editor', ok: 200, body: () => ({ settings: analysisSettings }) },
  { route: 'GET /api/workspaces/:wid/scenarios/:sid/snapshots', need: 'editor', ok: 200 },
  { route: 'POST /api/workspaces/:wid/scenarios/:sid/snapshots', need: 'editor', ok: 201, body: () => ({ notes: 'matrix' }) },
  { route: 'GET /api/workspaces/:wid/snapshots', need: 'editor', ok: 200 },
  { route: 'PATCH /api/workspaces/:wid/snapshots/:id', need: 'editor', ok: 200, body: () => ({ expiresAt: inADay() }) },
  { route: 'POST /api/workspaces/:wid/snapshots/:id/revoke', need: 'editor', ok: 200 },
  { route: 'POST /api/workspaces/:wid/snapshots/:id/send', need: 'editor', ok: 200, body: () => ({ to: ['reader@example.org'], note: 'matrix' }) },
  // A share link is read by anyone who holds it, signed in or not, member or not.
  { route: 'GET /api/snapshots/:id', need: 'anyone', ok: 200 },
  { route: 'GET /api/snapshots/:id/scenario.json', need: 'anyone', ok: 200 },
  { route: 'GET /api/snapshots/:id/totals.csv', need: 'anyone', ok: 200 },
  { route: 'GET /api/snapshots/:id/ledger.csv', need: 'anyone', ok: 200 },
  { route: 'GET /api/snapshots/:id/report.pdf', need: 'anyone', ok: 200 },
  { route: 'GET /s/:id', need: 'anyone', ok: () => (clientBuilt() ? 200 : 404) },
  // Forking copies into the workspace named in the body: editor there or better; not a member there is 404.
  { route: 'POST /api/snapshots/:id/fork', need: 'editor', ok: 201, body: (p) => ({ workspaceId: p.wid, title: 'Forked in the matrix' }) },
  { route: 'GET /api/workspaces/:wid/measurements', need: 'viewer', ok: 200 },
  {
    route: 'POST /api/workspaces/:wid/measurements',
    need: 'editor',
    ok: 201,
    send: (c, _path, p) => upload(c, p.wid ?? '', { kind: 'grid', label: 'Matrix grid', areaM2: 1.44, wallWatts: 320 }, { name: 'grid.csv', bytes: GRID_3X3 }),
  },
  { route: 'GET /api/workspaces/:wid/measurements/:mid', need: 'viewer', ok: 200 },
  { route: 'GET /api/workspaces/:wid/measurements/:mid/file', need: 'viewer', ok: 200 },
  { route: 'POST /api/workspaces/:wid/measurements/:mid/apply', need: 'editor', ok: 200, body: (p) => ({ fixtureId: p.fid }) },
  { route: 'DELETE /api/workspaces/:wid/measurements/:mid', need: 'owner', ok: 204 },
  { route: 'GET /api/admin/users', need: 'site-admin', ok: 200 },
  { route: 'PATCH /api/admin/users/:uid', need: 'site-admin', ok: 200, body: () => ({ name: 'Renamed By Admin' }) },
  { route: 'GET /api/admin/mail', need: 'site-admin', ok: 200 },
];

/** A fresh workspace for one actor, with a published snapshot and a stored grid only when the route needs them. */
async function seed(route: RouteKey): Promise<Params> {
  const people = (['viewer', 'editor', 'owner'] as const).map((role) => ({ email: demoAccount(role).email, role }));
  const w = await seedWorkspace(app.m, people);
  const p: Params = { wid: w.workspaceId, fid: w.fixtureId, sid: w.scenarioId, iid: w.invitationId, token: w.invitationToken, userId: w.extraMemberId, uid: w.extraMemberId, rev: '1' };
  const owner = clients.get('owner');
  if (!owner) throw new Error('no owner client');
  if (/\/(snapshots|s)\/:id/.test(route)) {
    const made = await owner.post(`/api/workspaces/${p.wid}/scenarios/${p.sid}/snapshots`, {});
    if (made.status !== 201) throw new Error(`publishing for the matrix failed: ${made.status} ${made.text}`);
    p.id = made.body.snapshot.id as string;
  }
  if (route.includes(':mid')) {
    const made = await upload(owner, p.wid ?? '', { kind: 'grid', areaM2: 1.44, wallWatts: 320 }, { name: 'grid.csv', bytes: GRID_3X3 });
    if (made.status !== 201) throw new Error(`uploading for the matrix failed: ${made.status} ${made.text}`);
    p.mid = made.body.measurement.id as string;
  }
  return p;
}

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
  exampleId = (await app.client().get('/api/examples')).body.examples[0].id as string;
});
afterAll(async () => app?.close());

describe('the role matrix', () => {
  it('lists every route the app serves, and no route it does not serve', () => {
    const served = appRoutes(app.running.sequelize).filter((r) => !NOT_API.includes(r));
    expect(CASES.map((c) => c.route).sort()).toEqual(served);
    expect(new Set(CASES.map((c) => c.route)).size).toBe(CASES.length);
  });

  it('finds the routes answered before the router by the code’s own matcher', () => {
    for (const r of OUTSIDE_ROUTER) expect(answeredOutsideRouter(fill(r, { id: 'abcdefghijklmnopqrstu' })), r).toBe(true);
  });
});

describe('roles on every API route', () => {
  for (const c of CASES) {
    it(`${c.route} answers each role as promised`, async () => {
      const got: Record<string, number> = {};
      const want: Record<string, number> = {};
      const method = c.route.slice(0, c.route.indexOf(' '));
      for (const actor of ACTORS) {
        const p = { ...(await seed(c.route)), ...(await c.prepare?.(actor)) };
        const client = clients.get(actor);
        if (!client) throw new Error(`no client for ${actor}`);
        const path = fill(c.route, p);
        const reply = c.send ? await c.send(client, path, p) : await client.send(method, path, { body: c.body?.(p, actor), headers: c.headers });
        got[actor] = reply.status;
        want[actor] = expected(c, actor);
        expect(reply.status, `${actor}: ${reply.text.slice(0, 300)}`).not.toBe(500);
        if (reply.status >= 400 && path.startsWith('/api/')) errorBodySchema.parse(reply.body);
      }
      expect(got).toEqual(want);
    });
  }

  it('DELETE /api/workspaces/:wid/members/:userId on one’s own id lets any member leave, except the last owner (409)', async () => {
    const got: Record<string, number> = {};
    for (const actor of ACTORS) {
      const p = await seed('DELETE /api/workspaces/:wid/members/:userId');
      const client = clients.get(actor);
      const self = actor === 'anonymous' ? p.userId : ((await client?.get('/api/me'))?.body.user.id as string);
      const reply = await client?.delete(`/api/workspaces/${p.wid}/members/${self}`);
      got[actor] = reply?.status ?? 0;
    }
    expect(got).toEqual({ anonymous: 401, viewer: 204, editor: 204, owner: 409, outsider: 404, admin: 404 });
  });

  it('leaves every signed-in caller signed in as themselves after the refused sign-ins above', async () => {
    for (const actor of ['viewer', 'editor', 'owner', 'admin'] as const) {
      expect((await clients.get(actor)?.get('/api/me'))?.body.user?.email).toBe(demoAccount(actor).email);
    }
  });
});
