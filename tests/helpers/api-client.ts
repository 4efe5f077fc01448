/* eslint-disable @typescript-eslint/no-explicit-any -- replies are loosely typed on purpose: each test checks the fields it cares about, or parses with a shared schema */
import { CookieJar } from './cookie-jar';

/** A response read once: status, headers and the body as text and (when it is JSON) parsed. */
export interface ApiReply<T = any> {
  status: number;
  headers: Headers;
  text: string;
  body: T;
}

export interface SendOptions {
  /** A JSON body (objects are serialised) or raw text sent as is. */
  body?: unknown;
  headers?: Record<string, string>;
  /** Leave out the X-CSRF-Token header. */
  noCsrf?: boolean;
}

/**
 * A browser-like client of the running server: keeps cookies, fetches the CSRF token from
 * GET /api/me and sends it on every write, and signs in through Auth.js's own endpoints.
 */
export class ApiClient {
  readonly jar = new CookieJar();
  csrfToken: string | undefined;

  constructor(public base: string) {}

  /** Any request; JSON bodies get Content-Type application/json unless a header says otherwise. */
  async send<T = any>(method: string, path: string, o: SendOptions = {}): Promise<ApiReply<T>> {
    const headers: Record<string, string> = { ...o.headers };
    let body: string | undefined;
    if (o.body !== undefined) {
      body = typeof o.body === 'string' ? o.body : JSON.stringify(o.body);
      if (!Object.keys(headers).some((h) => h.toLowerCase() === 'content-type')) headers['content-type'] = 'application/json';
    }
    const unsafe = !['GET', 'HEAD', 'OPTIONS'].includes(method);
    if (unsafe && !o.noCsrf && path.startsWith('/api/')) {
      if (this.csrfToken === undefined) await this.refreshCsrf();
      headers['x-csrf-token'] = this.csrfToken ?? '';
    }
    const cookie = this.jar.header();
    if (cookie) headers.cookie = cookie;
    const res = await fetch(`${this.base}${path}`, { method, headers, body, redirect: 'manual' });
    this.jar.store(res);
    const text = await res.text();
    let parsed: unknown = undefined;
    if ((res.headers.get('content-type') ?? '').includes('json') && text) parsed = JSON.parse(text);
    return { status: res.status, headers: res.headers, text, body: parsed as T };
  }

  get<T = any>(path: string, o?: SendOptions) { return this.send<T>('GET', path, o); }
  post<T = any>(path: string, body?: unknown, o?: SendOptions) { return this.send<T>('POST', path, { ...o, body }); }
  put<T = any>(path: string, body?: unknown, o?: SendOptions) { return this.send<T>('PUT', path, { ...o, body }); }
  patch<T = any>(path: string, body?: unknown, o?: SendOptions) { return this.send<T>('PATCH', path, { ...o, body }); }
  delete<T = any>(path: string, o?: SendOptions) { return this.send<T>('DELETE', path, o); }

  /** Reads GET /api/me and keeps its CSRF token. */
  async refreshCsrf(): Promise<ApiReply> {
    const me = await this.get('/api/me');
    this.csrfToken = me.body?.csrfToken;
    return me;
  }

  /** Auth.js's own CSRF token (GET /auth/csrf; it also sets Auth.js's CSRF cookie). */
  async authCsrf(): Promise<string> {
    const reply = await this.get<{ csrfToken: string }>('/auth/csrf');
    return reply.body.csrfToken;
  }

  /**
   * Signs in with e-mail and password exactly as the web client does: POST
   * /auth/callback/credentials (form-encoded, Auth.js CSRF token, X-Auth-Return-Redirect: 1).
   * Returns Auth.js's reply; on success the session cookie is in the jar and a fresh /api CSRF token is read.
   */
  async signIn(email: string, password: string): Promise<ApiReply<{ url: string }>> {
    const csrfToken = await this.authCsrf();
    const reply = await this.send<{ url: string }>('POST', '/auth/callback/credentials', {
      body: new URLSearchParams({ email, password, csrfToken, callbackUrl: '/' }).toString(),
      headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-auth-return-redirect': '1' },
    });
    await this.refreshCsrf();
    return reply;
  }

  /** Asks Auth.js to e-mail a sign-in link (POST /auth/signin/nodemailer). */
  async requestSignInLink(email: string): Promise<ApiReply<{ url: string }>> {
    const csrfToken = await this.authCsrf();
    return this.send<{ url: string }>('POST', '/auth/signin/nodemailer', {
      body: new URLSearchParams({ email, csrfToken, callbackUrl: '/' }).toString(),
      headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-auth-return-redirect': '1' },
    });
  }

  /** Opens a link from an e-mail (the path and query are used against this server). */
  async openLink(link: string): Promise<ApiReply> {
    const url = new URL(link);
    const reply = await this.get(`${url.pathname}${url.search}`);
    await this.refreshCsrf();
    return reply;
  }

  /** Signs out through Auth.js (POST /auth/signout with its CSRF token). */
  async signOut(): Promise<ApiReply> {
    const csrfToken = await this.authCsrf();
    const reply = await this.send('POST', '/auth/signout', {
      body: new URLSearchParams({ csrfToken }).toString(),
      headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-auth-return-redirect': '1' },
    });
    await this.refreshCsrf();
    return reply;
  }
}
