import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Sequelize } from 'sequelize';
import { afterAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/connection';
import { ApiClient } from '../helpers/api-client';
import { MailReader, linkIn } from '../helpers/caught-mail';
import { demoAccount } from '../helpers/test-app';
import { startChildServer } from './child-server';
import type { ChildServer } from './child-server';

const databasePath = join(mkdtempSync(join(tmpdir(), 'pp-logs-')), 'logs.sqlite');
const AUTH_SECRET = 'log-test-secret-0123456789abcdefghijklmnopqrstuvwxyz';
let server: ChildServer | undefined;
let db: Sequelize | undefined;

afterAll(async () => {
  server?.process.kill('SIGKILL');
  await db?.close();
});

describe('server logs', () => {
  it('hold request ids but never a password, token, session cookie or the secret, through sign-up, sign-in, link sign-in, invitation and password change', { timeout: 180_000 }, async () => {
    server = await startChildServer(databasePath, { LOG_LEVEL: 'trace', AUTH_SECRET });
    db = await openDatabase(databasePath);
    const mail = new MailReader(db);
    const secrets: Record<string, string> = { AUTH_SECRET };

    const email = 'log-person@example.org';
    const first = 'first-password-of-log-person';
    const second = 'second-password-of-log-person';
    secrets['password at sign-up'] = first;
    secrets['new password'] = second;
    const person = new ApiClient(server.base);
    expect((await person.post('/api/account/sign-up', { email, name: 'Log Person', password: first })).status).toBe(201);
    expect((await person.signIn(email, first)).body.url).not.toContain('error=');
    secrets['session cookie'] = person.jar.get('authjs.session-token') ?? '';
    secrets['API CSRF token'] = person.csrfToken ?? '';
    secrets['Auth.js CSRF cookie'] = person.jar.get('authjs.csrf-token') ?? '';
    expect((await person.post('/api/account/password', { currentPassword: first, newPassword: second })).status).toBe(200);

    const linkClient = new ApiClient(server.base);
    await linkClient.requestSignInLink(email);
    const signInLink = new URL(linkIn(await mail.latestTo(email), '/auth/callback/nodemailer'));
    secrets['sign-in link token'] = signInLink.searchParams.get('token') ?? '';
    expect((await linkClient.openLink(signInLink.toString())).status).toBe(302);
    secrets['session cookie from the link'] = linkClient.jar.get('authjs.session-token') ?? '';

    const owner = new ApiClient(server.base);
    const ownerAccount = demoAccount('owner');
    secrets['demo owner password'] = ownerAccount.password;
    await owner.signIn(ownerAccount.email, ownerAccount.password);
    secrets['owner session cookie'] = owner.jar.get('authjs.session-token') ?? '';
    const wid = (await owner.get('/api/me')).body.memberships.find((m: { role: string }) => m.role === 'owner').workspaceId as string;
    const invitee = 'log-invitee@example.org';
    expect((await owner.post(`/api/workspaces/${wid}/invitations`, { email: invitee, role: 'viewer' })).status).toBe(201);
    const invitationToken = new URL(linkIn(await mail.latestTo(invitee))).pathname.split('/').pop() ?? '';
    secrets['invitation token'] = invitationToken;
    const guest = new ApiClient(server.base);
    expect((await guest.get(`/api/invitations/${invitationToken}`)).status).toBe(200);
    expect((await guest.post('/api/account/sign-up', { email: invitee, name: 'Log Invitee', password: 'invitee-password-long' })).status).toBe(201);
    secrets['invitee password'] = 'invitee-password-long';
    await guest.signIn(invitee, 'invitee-password-long');
    expect((await guest.post(`/api/invitations/${invitationToken}/accept`)).status).toBe(200);
    await guest.post('/api/workspaces', { name: { password: 'nested-secret-in-a-bad-body' } });
    secrets['password inside a refused body'] = 'nested-secret-in-a-bad-body';

    server.process.kill('SIGTERM');
    expect(await server.exited).toBe(0);
    const log = server.output.join('\n');
    const requestLines = server.output.filter((l) => l.includes('"requestId"'));
    expect(requestLines.length).toBeGreaterThan(15);
    for (const [what, value] of Object.entries(secrets)) {
      expect(value.length, `${what} was captured`).toBeGreaterThan(8);
      expect(log.includes(value), `${what} appears in the log`).toBe(false);
      expect(log.includes(encodeURIComponent(value)), `${what} (URL-encoded) appears in the log`).toBe(false);
    }
  });
});
