import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { linkIn } from '../helpers/caught-mail';
import { demoAccount, startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { GRID_3X3, download, upload } from '../measurements/uploads';
import { sampleScenario } from '../helpers/seed';

// Invitations (one use, revoked, older than 7 days) are covered in tests/api/invitations.test.ts,
// a used sign-in link in tests/api/sign-in.test.ts, and every route × role in tests/api/role-matrix.test.ts.

const SESSION = 'authjs.session-token';
let app: TestApp;

beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => app?.close());

describe('sessions', () => {
  it('issues a new session cookie at every sign-in, replacing one planted before it', async () => {
    const owner = demoAccount('owner');
    const c = app.client();
    c.jar.set(SESSION, 'planted-by-someone-else');
    await c.signIn(owner.email, owner.password);
    const first = c.jar.get(SESSION);
    expect(first).toBeDefined();
    expect(first).not.toBe('planted-by-someone-else');
    await c.signOut();
    expect(c.jar.has(SESSION)).toBe(false);
    await c.signIn(owner.email, owner.password);
    const second = c.jar.get(SESSION);
    expect(second).toBeDefined();
    expect(second).not.toBe(first);
    expect((await c.get('/api/me')).body.user.email).toBe(owner.email);
  });

  it('refuses a sign-in link once it has expired', async () => {
    const editor = demoAccount('editor');
    const c = app.client();
    await c.requestSignInLink(editor.email);
    const link = linkIn(await app.mail.latestTo(editor.email), '/auth/callback/nodemailer');
    const [[pending]] = (await app.running.sequelize.query('SELECT COUNT(*) AS n FROM verification_tokens WHERE identifier = ?', { replacements: [editor.email] })) as [Array<{ n: number }>, unknown];
    expect(pending!.n).toBeGreaterThan(0);
    await app.running.sequelize.query("UPDATE verification_tokens SET expires = '2000-01-01 00:00:00.000 +00:00' WHERE identifier = ?", { replacements: [editor.email] });
    await c.openLink(link);
    expect((await c.get('/api/me')).body.user).toBeNull();
  });
});

describe('stored files', () => {
  it('serves an uploaded measurement file to members only: 401 without a session, 404 to an outsider, the bytes to a viewer', async () => {
    const editor = await app.signInAs('editor');
    const wid = (await editor.get('/api/me')).body.memberships[0].workspaceId as string;
    const made = await upload(editor, wid, { kind: 'grid' }, { name: 'grid.csv', bytes: GRID_3X3 });
    expect(made.status).toBe(201);
    const mid = made.body.measurement.id as string;
    const viewer = await app.signInAs('viewer');
    const outsider = await app.signUpAndIn('outsider-files@example.org');
    expect((await download(app.client(), wid, mid)).status).toBe(401);
    expect((await download(outsider, wid, mid)).status).toBe(404);
    const got = await download(viewer, wid, mid);
    expect(got.status).toBe(200);
    expect(got.bytes.toString('utf8')).toBe(GRID_3X3);
  });

  it('stops serving a snapshot and its files once the link is revoked', async () => {
    const owner = await app.signInAs('owner');
    const wid = (await owner.get('/api/me')).body.memberships.find((m: { role: string }) => m.role === 'owner').workspaceId as string;
    const sid = (await owner.post(`/api/workspaces/${wid}/scenarios`, { document: sampleScenario('Shared then revoked') })).body.scenario.id as string;
    const snap = (await owner.post(`/api/workspaces/${wid}/scenarios/${sid}/snapshots`, {})).body.snapshot.id as string;
    const files = ['', '/scenario.json', '/totals.csv', '/ledger.csv'];
    for (const f of files) expect((await app.client().get(`/api/snapshots/${snap}${f}`)).status, f).toBe(200);
    expect((await owner.post(`/api/workspaces/${wid}/snapshots/${snap}/revoke`)).status).toBe(200);
    for (const f of [...files, '/report.pdf']) expect((await app.client().get(`/api/snapshots/${snap}${f}`)).status, f).toBe(410);
  });
});

describe('content security policy', () => {
  it('allows scripts from this origin only: no unsafe-inline or unsafe-eval in script-src, on the API, the app and snapshot pages', async () => {
    for (const path of ['/api/me', '/', '/s/AAAAAAAAAAAAAAAAAAAAA']) {
      const csp = (await fetch(`${app.base}${path}`)).headers.get('content-security-policy') ?? '';
      const scriptSrc = csp.split(';').map((d) => d.trim()).find((d) => d.startsWith('script-src')) ?? '';
      expect(scriptSrc, path).toBe("script-src 'self'");
      expect(csp).toContain("object-src 'none'");
    }
  });
});
