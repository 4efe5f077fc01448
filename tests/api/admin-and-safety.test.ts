import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adminUserListResponseSchema, caughtMailListResponseSchema } from '../../src/contracts/api/admin';
import { boot } from '../../server/boot';
import { ConfigError, readConfig } from '../../server/config';
import { createLogger } from '../../server/logger';
import type { ApiClient } from '../helpers/api-client';
import { demoAccount, startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

let app: TestApp;
let admin: ApiClient;

beforeAll(async () => {
  app = await startTestApp();
  admin = await app.signInAs('admin');
});
afterAll(async () => app?.close());

describe('site admins', () => {
  it('list accounts with a search', async () => {
    const page = adminUserListResponseSchema.parse((await admin.get('/api/admin/users?q=hollowbrook')).body);
    expect(page.items.map((u) => u.email).sort()).toEqual([demoAccount('viewer').email, demoAccount('owner').email].sort());
  });

  it('disable an account: its sessions end and it can no longer sign in', async () => {
    const victim = await app.signUpAndIn('to-disable@example.org');
    const id = (await victim.get('/api/me')).body.user.id;
    const reply = await admin.patch(`/api/admin/users/${id}`, { disabled: true });
    expect(reply.status).toBe(200);
    expect(reply.body.user.disabled).toBe(true);
    expect((await victim.get('/api/me')).body.user).toBeNull();
    expect((await app.client().signIn('to-disable@example.org', 'a-test-password-of-length')).body.url).toContain('error=');
  });

  it('cannot remove their own admin rights', async () => {
    const me = (await admin.get('/api/me')).body.user.id;
    expect((await admin.patch(`/api/admin/users/${me}`, { isSiteAdmin: false })).status).toBe(409);
  });

  it('read the mail the local fake SMTP server caught', async () => {
    await app.client().requestSignInLink(demoAccount('viewer').email);
    const list = caughtMailListResponseSchema.parse((await admin.get('/api/admin/mail')).body);
    expect(list.messages[0]).toMatchObject({ to: [demoAccount('viewer').email], subject: 'Your Photon Parity sign-in link' });
    expect(list.messages[0]?.text).toContain('/auth/callback/nodemailer?');
  });
});

describe('rate limits', () => {
  it('stop password guessing against one account after 10 tries in 15 minutes', async () => {
    const email = demoAccount('owner').email;
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) statuses.push((await app.client().signIn(email, `wrong-guess-number-${i}`)).status);
    expect(statuses.slice(0, 10).every((s) => s === 200)).toBe(true);
    expect(statuses[10]).toBe(429);
    const last = await app.client().signIn(email, demoAccount('owner').password);
    expect(last.status).toBe(429);
    expect(last.body).toMatchObject({ error: { code: 'rate_limited' } });
  });
});

describe('security headers', () => {
  it('sends a content security policy and no X-Powered-By', async () => {
    const res = await fetch(`${app.base}/api/me`);
    expect(res.headers.get('content-security-policy')).toContain("default-src 'self'");
    expect(res.headers.get('x-powered-by')).toBeNull();
  });
});

describe('demo passwords in production', () => {
  it('refuse to start while a demo account still has its published password', async () => {
    await app.running.close();
    const config = readConfig({
      NODE_ENV: 'production',
      PORT: '0',
      HOST: '127.0.0.1',
      ...app.databaseEnv,
      AUTH_SECRET: 'a-production-secret-of-at-least-32-characters',
      SMTP_URL: 'smtp://127.0.0.1:9',
    });
    const started = boot(config, createLogger('silent'));
    await expect(started).rejects.toBeInstanceOf(ConfigError);
    await expect(started).rejects.toThrow(/published passwords/);
    await app.close();
    app = await startTestApp();
  });
});
