import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { demoScope, publish } from './snapshot-setup';
import type { DemoScope } from './snapshot-setup';

/** Headers every response carries from helmet, compared between the snapshot read and an Express route. */
const SECURITY_HEADERS = ['content-security-policy', 'x-content-type-options', 'x-frame-options', 'strict-transport-security', 'referrer-policy', 'cross-origin-opener-policy', 'cross-origin-resource-policy'];

describe('the public read of a snapshot’s data (answered ahead of the Express routes)', () => {
  let app: TestApp;
  let d: DemoScope;
  beforeAll(async () => {
    app = await startTestApp();
    d = await demoScope(app);
  });
  afterAll(() => app.close());

  it('carries the same security headers as every other route, a request id, and exact JSON with its length', async () => {
    const { id } = await publish(d.editor, d.wid, d.sid);
    const reader = app.client();
    const [data, health] = await Promise.all([reader.get(`/api/snapshots/${id}`), reader.get('/api/health/live')]);
    expect(data.status).toBe(200);
    for (const name of SECURITY_HEADERS) {
      expect(health.headers.get(name), name).toBeTruthy();
      expect(data.headers.get(name), name).toBe(health.headers.get(name));
    }
    expect(data.headers.get('x-request-id')).toMatch(/^[0-9a-f-]{36}$/);
    expect(data.headers.get('content-type')).toBe('application/json; charset=utf-8');
    expect(Number(data.headers.get('content-length'))).toBe(Buffer.byteLength(data.text));
    expect(data.body.link.status).toBe('live');
    expect(data.body.snapshot.id).toBe(id);
  });

  it('answers 304 to a matching If-None-Match, and HEAD with the length and no body', async () => {
    const { id } = await publish(d.editor, d.wid, d.sid);
    const reader = app.client();
    const first = await reader.get(`/api/snapshots/${id}`);
    const etag = first.headers.get('etag')!;
    const again = await reader.get(`/api/snapshots/${id}`, { headers: { 'if-none-match': `W/${etag}, "other"` } });
    expect(again.status).toBe(304);
    expect(again.text).toBe('');
    const head = await reader.send('HEAD', `/api/snapshots/${id}`);
    expect(head.status).toBe(200);
    expect(head.headers.get('content-length')).toBe(first.headers.get('content-length'));
    expect(head.text).toBe('');
  });

  it('gives the one error shape, with the request id, for an unknown id and a revoked link', async () => {
    const { id } = await publish(d.editor, d.wid, d.sid);
    const reader = app.client();
    const unknown = await reader.get(`/api/snapshots/${id.slice(0, 20)}${id.endsWith('A') ? 'B' : 'A'}`);
    expect(unknown.status).toBe(404);
    expect(unknown.body.error).toMatchObject({ code: 'not_found', requestId: unknown.headers.get('x-request-id') });
    expect(unknown.headers.get('content-security-policy')).toBeTruthy();
    expect((await d.editor.post(`/api/workspaces/${d.wid}/snapshots/${id}/revoke`)).status).toBe(200);
    const gone = await reader.get(`/api/snapshots/${id}`);
    expect(gone.status).toBe(410);
    expect(gone.body.error).toMatchObject({ code: 'gone', fields: [{ path: 'link', message: 'revoked' }] });
  });

  it('never answers "live" after the revocation was answered, even while many readers share one lookup', async () => {
    const { id } = await publish(d.editor, d.wid, d.sid);
    const reader = app.client();
    const during = Array.from({ length: 200 }, () => reader.get(`/api/snapshots/${id}`));
    const revoked = await d.editor.post(`/api/workspaces/${d.wid}/snapshots/${id}/revoke`);
    expect(revoked.status).toBe(200);
    const after = await Promise.all(Array.from({ length: 50 }, () => reader.get(`/api/snapshots/${id}`)));
    expect(after.map((r) => r.status)).toEqual(after.map(() => 410));
    const statuses = new Set((await Promise.all(during)).map((r) => r.status));
    expect([...statuses].every((s) => s === 200 || s === 410)).toBe(true);
  });

  it('leaves other snapshot routes (downloads) and unknown paths under /api/snapshots to the app', async () => {
    const { id } = await publish(d.editor, d.wid, d.sid);
    const reader = app.client();
    const csv = await reader.get(`/api/snapshots/${id}/totals.csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-type')).toContain('text/csv');
    const bad = await reader.get('/api/snapshots/not*an*id');
    expect(bad.status).toBe(404);
    expect(bad.body.error.code).toBe('not_found');
  });
});
