import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { meResponseSchema } from '../../src/contracts/api/account';
import { linkIn } from '../helpers/caught-mail';
import { demoAccount, startTestApp, TEST_PASSWORD } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => app?.close());

describe('accounts and sign-in', () => {
  it('tells an anonymous visitor that nobody is signed in, with a CSRF token', async () => {
    const me = await app.client().get('/api/me');
    expect(me.status).toBe(200);
    const body = meResponseSchema.parse(me.body);
    expect(body.user).toBeNull();
    expect(body.csrfToken.length).toBeGreaterThan(20);
  });

  it('signs a demo owner in with a password through Auth.js and lists their workspace', async () => {
    const c = await app.signInAs('owner');
    const me = meResponseSchema.parse((await c.get('/api/me')).body);
    expect(me.user?.email).toBe(demoAccount('owner').email);
    expect(me.memberships).toEqual([
      expect.objectContaining({ name: "Hollow Brook Growers' Co-operative", role: 'owner', currency: 'EUR', unitSystem: 'si' }),
    ]);
    const cookie = c.jar.header() ?? '';
    expect(cookie).toContain('authjs.session-token=');
  });

  it('sets the session cookie httpOnly and SameSite=Lax', async () => {
    const c = app.client();
    const csrfToken = await c.authCsrf();
    const a = demoAccount('viewer');
    const res = await fetch(`${app.base}/auth/callback/credentials`, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: c.jar.header() ?? '' },
      body: new URLSearchParams({ email: a.email, password: a.password, csrfToken }).toString(),
    });
    const session = res.headers.getSetCookie().find((s) => s.startsWith('authjs.session-token='));
    expect(session).toMatch(/HttpOnly/i);
    expect(session).toMatch(/SameSite=Lax/i);
  });

  it('answers a wrong password and an unknown account with the same failure', async () => {
    const wrong = await app.client().signIn(demoAccount('owner').email, 'not-the-right-password');
    const unknown = await app.client().signIn('nobody-here@hollowbrook.example', 'not-the-right-password');
    expect(wrong.status).toBe(unknown.status);
    expect(wrong.body.url).toContain('error=CredentialsSignin');
    expect(new URL(wrong.body.url).search).toBe(new URL(unknown.body.url).search);
  });

  it('signs up a new account, which then signs in with its password', async () => {
    const c = await app.signUpAndIn('new.grower@example.org', 'New Grower');
    const me = meResponseSchema.parse((await c.get('/api/me')).body);
    expect(me.user).toMatchObject({ email: 'new.grower@example.org', name: 'New Grower', isSiteAdmin: false });
    expect(me.memberships).toEqual([]);
  });

  it('refuses a password shorter than 12 characters at sign-up, naming the field', async () => {
    const reply = await app.client().post('/api/account/sign-up', { email: 'short@example.org', name: 'Short', password: 'short' });
    expect(reply.status).toBe(400);
    expect(reply.body.error.fields).toEqual([{ path: 'password', message: 'must be at least 12 characters' }]);
  });

  it('signs in from the link in the caught e-mail', async () => {
    const a = demoAccount('editor');
    const c = app.client();
    const asked = await c.requestSignInLink(a.email);
    expect(asked.status).toBe(200);
    const mail = await app.mail.latestTo(a.email);
    expect(mail.subject).toBe('Your Photon Parity sign-in link');
    const link = linkIn(mail, '/auth/callback/nodemailer');
    const opened = await c.openLink(link);
    expect(opened.status).toBe(302);
    const me = meResponseSchema.parse((await c.get('/api/me')).body);
    expect(me.user?.email).toBe(a.email);
    // The link works once.
    const again = app.client();
    await again.openLink(link);
    expect(meResponseSchema.parse((await again.get('/api/me')).body).user).toBeNull();
  });

  it('mails no link to an unknown address, and answers exactly as for a known one', async () => {
    const before = await app.mail.countTo('stranger@example.org');
    const unknown = await app.client().requestSignInLink('stranger@example.org');
    const known = await app.client().requestSignInLink(demoAccount('viewer').email);
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    expect(await app.mail.countTo('stranger@example.org')).toBe(before);
  });

  it('changes a password: the old one stops working, this session stays, other sessions end', async () => {
    const email = 'changer@example.org';
    const here = await app.signUpAndIn(email, 'Changer');
    const elsewhere = app.client();
    await elsewhere.signIn(email, TEST_PASSWORD);
    const newPassword = 'another-password-long-enough';
    const changed = await here.post('/api/account/password', { currentPassword: TEST_PASSWORD, newPassword });
    expect(changed.status).toBe(200);
    expect((await here.get('/api/me')).body.user.email).toBe(email);
    expect((await elsewhere.get('/api/me')).body.user).toBeNull();
    expect((await app.client().signIn(email, TEST_PASSWORD)).body.url).toContain('error=');
    expect((await app.client().signIn(email, newPassword)).body.url).not.toContain('error=');
  });

  it('refuses a password change with a wrong current password', async () => {
    const c = await app.signUpAndIn('wrong-current@example.org');
    const reply = await c.post('/api/account/password', { currentPassword: 'not-it-at-all', newPassword: 'a-fine-new-password' });
    expect(reply.status).toBe(400);
    expect(reply.body.error.fields[0].path).toBe('currentPassword');
  });

  it('signs out through Auth.js', async () => {
    const c = await app.signInAs('viewer');
    await c.signOut();
    expect((await c.get('/api/me')).body.user).toBeNull();
  });

  it('keeps a session across a server restart (same AUTH_SECRET, same database)', async () => {
    const c = await app.signInAs('owner');
    await app.restart(c);
    const me = await c.get('/api/me');
    expect(me.body.user.email).toBe(demoAccount('owner').email);
  });
});
