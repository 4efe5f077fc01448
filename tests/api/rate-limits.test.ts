import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiReply } from '../helpers/api-client';
import { TEST_PASSWORD, demoAccount, startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

let app: TestApp;

beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => app?.close());

// Each test speaks from its own address (documentation ranges of RFC 5737), which the server reads
// from X-Forwarded-For behind its one trusted proxy hop, so the tests' counts stay apart.
const from = (address: string) => ({ headers: { 'x-forwarded-for': address } });

function statusesOf(replies: ApiReply[]): number[] {
  return replies.map((r) => r.status);
}

function expectRefused(reply: ApiReply) {
  expect(reply.status).toBe(429);
  expect(reply.body).toMatchObject({ error: { code: 'rate_limited' } });
}

describe('rate limits', () => {
  it('take 20 new accounts an hour from one address, then refuse the 21st; another address may still sign up', { timeout: 120_000 }, async () => {
    const c = app.client();
    const replies: ApiReply[] = [];
    for (let i = 0; i < 21; i++) {
      replies.push(await c.post('/api/account/sign-up', { email: `limit-${i}@example.test`, name: `Limit ${i}`, password: TEST_PASSWORD }, from('192.0.2.10')));
    }
    expect(statusesOf(replies.slice(0, 20))).toEqual(Array(20).fill(201));
    expectRefused(replies[20]!);
    expect((await c.post('/api/account/sign-up', { email: 'elsewhere@example.test', name: 'Elsewhere', password: TEST_PASSWORD }, from('192.0.2.11'))).status).toBe(201);
  });

  it('take 50 invitations an hour from one owner, then refuse the 51st', { timeout: 120_000 }, async () => {
    const owner = await app.signInAs('owner');
    const wid = (await owner.get('/api/me')).body.memberships.find((m: { role: string }) => m.role === 'owner').workspaceId as string;
    const replies: ApiReply[] = [];
    for (let i = 0; i < 51; i++) replies.push(await owner.post(`/api/workspaces/${wid}/invitations`, { email: `invitee-${i}@example.test`, role: 'viewer' }, from('198.51.100.20')));
    expect(statusesOf(replies.slice(0, 50))).toEqual(Array(50).fill(201));
    expectRefused(replies[50]!);
  });

  it('take 10 password changes in 15 minutes from one account, then refuse even the right current password', { timeout: 120_000 }, async () => {
    const viewer = await app.signInAs('viewer');
    const replies: ApiReply[] = [];
    for (let i = 0; i < 10; i++) {
      replies.push(await viewer.post('/api/account/password', { currentPassword: `not-the-password-${i}`, newPassword: 'a-new-password-for-the-test' }, from('203.0.113.30')));
    }
    expect(new Set(statusesOf(replies))).toEqual(new Set([400]));
    expectRefused(await viewer.post('/api/account/password', { currentPassword: demoAccount('viewer').password, newPassword: 'a-new-password-for-the-test' }, from('203.0.113.31')));
  });
});
