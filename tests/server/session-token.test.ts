import { encode } from '@auth/core/jwt';
import { describe, expect, it } from 'vitest';
import { readSession, sessionCookieName } from '../../server/auth/session-token';

const settings = { secret: 'a-secret-for-this-test-only-0123456789', secureCookies: false };
const name = sessionCookieName(settings);
const claims = { sub: 'user-1', sid: 'session-1', ver: 3 };

async function cookie(maxAge: number, secret = settings.secret): Promise<string> {
  return `other=1; ${name}=${await encode({ token: claims, secret, salt: name, maxAge })}`;
}

describe('reading the session cookie', () => {
  it('opens a cookie made with the secret, again and again, and nothing without one', async () => {
    const c = await cookie(60);
    expect(await readSession(c, settings)).toEqual(claims);
    expect(await readSession(c, settings)).toEqual(claims);
    expect(await readSession('other=1', settings)).toBeNull();
    expect(await readSession(undefined, settings)).toBeNull();
  });

  it('refuses a cookie that opened under one secret when the server has another', async () => {
    const c = await cookie(60);
    expect(await readSession(c, settings)).toEqual(claims);
    expect(await readSession(c, { ...settings, secret: 'another-secret-entirely-0123456789' })).toBeNull();
  });

  it('refuses a cookie whose JWT expired (beyond Auth.js’s 15 s clock tolerance), every time', async () => {
    const c = await cookie(-60);
    expect(await readSession(c, settings)).toBeNull();
    expect(await readSession(c, settings)).toBeNull();
  });

  it('refuses a cookie whose text was changed', async () => {
    const c = await cookie(60);
    expect(await readSession(`${c.slice(0, -2)}xx`, settings)).toBeNull();
  });
});
