import { randomUUID } from 'node:crypto';
import { encode, getToken } from '@auth/core/jwt';
import type { Response } from 'express';

/** How long a session lasts without use, in seconds: 30 days. */
export const SESSION_MAX_AGE_S = 30 * 24 * 60 * 60;

/** What the session cookie carries besides Auth.js's defaults. */
export interface SessionClaims {
  /** user id */
  sub: string;
  /** random per sign-in; binds the CSRF token to this session */
  sid: string;
  /** the account's session version when the session began */
  ver: number;
}

/** Settings shared by Auth.js and the API's own session reader. */
export interface SessionSettings {
  secret: string;
  /** Secure cookies (`__Secure-` prefix) when the public URL is https. */
  secureCookies: boolean;
}

/** Name of Auth.js's session cookie, which is also the JWT's key-derivation salt. */
export function sessionCookieName(s: SessionSettings): string {
  return `${s.secureCookies ? '__Secure-' : ''}authjs.session-token`;
}

/** New claims for a fresh sign-in. */
export function newClaims(userId: string, sessionVersion: number): SessionClaims {
  return { sub: userId, sid: randomUUID(), ver: sessionVersion };
}

/** The session cookie's value as sent (Auth.js splits a large one into .0, .1, … chunks), or undefined. */
function sessionCookieValue(cookieHeader: string, name: string): string | undefined {
  const parts: string[] = [];
  for (const pair of cookieHeader.split(';')) {
    const eq = pair.indexOf('=');
    const key = pair.slice(0, eq).trim();
    if (eq > 0 && (key === name || key.startsWith(`${name}.`))) parts.push(`${key}=${pair.slice(eq + 1).trim()}`);
  }
  return parts.length ? parts.sort().join(';') : undefined;
}

/** Sessions already opened, by secret and cookie value: at most this many, each until its JWT expires. */
const OPENED_MAX = 10_000;
const opened = new Map<string, { claims: SessionClaims; expiresAtMs: number }>();

/**
 * Reads and decrypts the session cookie of a request (Auth.js JWT session: an encrypted JWT that
 * only AUTH_SECRET opens, so a session survives a restart). Only the cookie is looked at.
 *
 * Opening one costs a key derivation and an AES decryption, each a round trip to libuv's thread
 * pool, on every request of a signed-in user; so a cookie that opened once is remembered (keyed by
 * the secret and the exact cookie text) until its own expiry. Nothing is weakened: only cookies
 * that decrypted are remembered, and the caller still checks the account and its session version
 * in the database on every request.
 */
export async function readSession(cookieHeader: string | undefined, s: SessionSettings, nowMs = Date.now()): Promise<SessionClaims | null> {
  if (!cookieHeader) return null;
  const salt = sessionCookieName(s);
  const value = sessionCookieValue(cookieHeader, salt);
  if (!value) return null;
  const key = `${s.secret}\0${value}`;
  const known = opened.get(key);
  if (known && known.expiresAtMs > nowMs) return known.claims;
  if (known) opened.delete(key);
  const token = await getToken({ req: { headers: { cookie: cookieHeader } }, secret: s.secret, secureCookie: s.secureCookies, cookieName: salt, salt });
  if (!token || typeof token.sub !== 'string' || typeof token.sid !== 'string' || typeof token.ver !== 'number') return null;
  const claims = { sub: token.sub, sid: token.sid, ver: token.ver };
  if (typeof token.exp === 'number') {
    if (opened.size >= OPENED_MAX) opened.delete(opened.keys().next().value as string);
    opened.set(key, { claims, expiresAtMs: token.exp * 1000 });
  }
  return claims;
}

/** Re-issues the session cookie with new claims, as Auth.js would (same name, flags and lifetime). */
export async function writeSession(res: Response, claims: SessionClaims & { name?: string; email?: string }, s: SessionSettings): Promise<void> {
  const name = sessionCookieName(s);
  const value = await encode({ token: { ...claims }, secret: s.secret, salt: name, maxAge: SESSION_MAX_AGE_S });
  res.cookie(name, value, { httpOnly: true, sameSite: 'lax', path: '/', secure: s.secureCookies, maxAge: SESSION_MAX_AGE_S * 1000 });
}
