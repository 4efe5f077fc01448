import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '../../src/contracts/api/errors';
import { FIXTURE_CSV_COLUMNS } from '../../src/contracts/api/fixtures';
import type { ApiClient } from '../helpers/api-client';
import { sampleScenario } from '../helpers/seed';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

let app: TestApp;
let editor: ApiClient;
let wid: string;

beforeAll(async () => {
  app = await startTestApp();
  editor = await app.signInAs('editor');
  wid = (await editor.get('/api/me')).body.memberships[0].workspaceId;
});
afterAll(async () => app?.close());

/** Every error reply: the one shape, a stable code, and no stack trace or SQL. */
function expectError(reply: { status: number; body: unknown; text: string }, status: number, code: string) {
  expect(reply.status).toBe(status);
  const body = errorBodySchema.parse(reply.body);
  expect(body.error.code).toBe(code);
  expect(body.error.requestId).toBeTruthy();
  expect(reply.text).not.toMatch(/\bat .+:\d+:\d+|SELECT |INSERT |SQLITE_|Sequelize/i);
  return body.error;
}

const fixture = { key: 'ok-led', label: 'OK LED', technology: 'led', wallWatts: 300, photonEfficacy: 2.6, fixturePrice: '400' };

function csvWithBadLine17(): string {
  const header = 'key,label,technology,wallWatts,photonEfficacy,fixturePrice';
  const lines = [header];
  // Line 1 is the header, so data lines are 2..; line 17 has a negative wattage.
  for (let line = 2; line <= 20; line++) lines.push(`bulk-${line},Bulk fixture ${line},led,${line === 17 ? -5 : 300},2.5,410.00`);
  return `${lines.join('\n')}\n`;
}

describe('bad input', () => {
  it('names an unknown field', async () => {
    const err = expectError(await editor.post(`/api/workspaces/${wid}/fixtures`, { ...fixture, colour: 'red' }), 400, 'invalid_input');
    expect(err.fields).toEqual([{ path: 'colour', message: 'is not a known field (check its spelling)' }]);
  });

  it('names every field of the wrong type at once', async () => {
    const err = expectError(await editor.post(`/api/workspaces/${wid}/fixtures`, { ...fixture, wallWatts: 'lots', owned: 'yes' }), 400, 'invalid_input');
    expect(err.fields).toEqual(expect.arrayContaining([{ path: 'wallWatts', message: 'must be a number' }, { path: 'owned', message: 'must be true or false' }]));
  });

  it('names a nested field of a scenario document', async () => {
    const document = { ...sampleScenario(), electricity: { pricePerKwh: '-1' } };
    const err = expectError(await editor.post(`/api/workspaces/${wid}/scenarios`, { document }), 400, 'invalid_input');
    expect(err.fields).toEqual([{ path: 'document.electricity.pricePerKwh', message: 'must not be negative' }]);
  });

  it('names a query parameter on a route that reads none, and an unknown one where a route reads some', async () => {
    const scenarioId = (await editor.get(`/api/workspaces/${wid}/scenarios`)).body.items[0].id as string;
    for (const path of [`/api/workspaces/${wid}/scenarios/${scenarioId}/result`, `/api/workspaces/${wid}/fixtures`, `/api/workspaces/${wid}/members`, '/api/workspaces', '/api/me']) {
      const err = expectError(await editor.get(`${path}?foo=1&pageSize=5`), 400, 'invalid_input');
      expect(err.fields, path).toEqual([
        { path: 'foo', message: 'is not a known field (check its spelling)' },
        { path: 'pageSize', message: 'is not a known field (check its spelling)' },
      ]);
    }
    expect((await editor.get(`/api/workspaces/${wid}/scenarios?q=room&pageSize=5`)).status).toBe(200);
    const err = expectError(await editor.get(`/api/workspaces/${wid}/scenarios?bogus=1`), 400, 'invalid_input');
    expect(err.fields).toEqual([{ path: 'bogus', message: 'is not a known field (check its spelling)' }]);
  });

  it('answers malformed JSON with 400 malformed_json', async () => {
    expectError(await editor.send('POST', `/api/workspaces/${wid}/fixtures`, { body: '{"key": "a",', headers: { 'content-type': 'application/json' } }), 400, 'malformed_json');
  });

  it('answers a body over the limit with 413', async () => {
    const huge = { ...fixture, notes: 'x'.repeat(300 * 1024) };
    expectError(await editor.post(`/api/workspaces/${wid}/fixtures`, huge), 413, 'payload_too_large');
  });

  it('answers a body that is not JSON with 415', async () => {
    expectError(await editor.send('POST', `/api/workspaces/${wid}/fixtures`, { body: 'key=a', headers: { 'content-type': 'application/x-www-form-urlencoded' } }), 415, 'unsupported_media_type');
  });

  it('answers bad paging with 400 naming the query parameter', async () => {
    const err = expectError(await editor.get(`/api/workspaces/${wid}/scenarios?pageSize=5000&sort=x`), 400, 'invalid_input');
    expect(err.fields.map((f) => f.path).sort()).toEqual(['pageSize', 'sort']);
  });

  it('refuses a fixture CSV with a bad line 17, names line 17, and stores nothing', async () => {
    const before = await app.m.Fixture.count();
    const reply = await editor.send('POST', `/api/workspaces/${wid}/fixtures/import`, { body: csvWithBadLine17(), headers: { 'content-type': 'text/csv' } });
    const err = expectError(reply, 400, 'invalid_input');
    expect(err.fields).toEqual([{ path: 'line 17, wallWatts', message: 'must be greater than 0' }]);
    expect(err.message).toContain('line 17');
    expect(await app.m.Fixture.count()).toBe(before);
  });

  it('counts lines inside quoted cells that span lines', async () => {
    const csv = 'key,label,technology,wallWatts,photonEfficacy,fixturePrice,notes\n' +
      'one,One,led,300,2.5,400,"two\nline note"\n' +
      'two,Two,led,300,9,400,\n';
    const err = expectError(await editor.send('POST', `/api/workspaces/${wid}/fixtures/import`, { body: csv, headers: { 'content-type': 'text/csv' } }), 400, 'invalid_input');
    expect(err.fields[0]?.path).toBe('line 4, photonEfficacy');
  });

  it('refuses unknown CSV columns on the header line', async () => {
    const err = expectError(await editor.send('POST', `/api/workspaces/${wid}/fixtures/import`, { body: 'key,label,technology,wallWatts,brand\n', headers: { 'content-type': 'text/csv' } }), 400, 'invalid_input');
    expect(err.fields[0]?.path).toBe('line 1, brand');
  });

  it('imports a good CSV and exports every column back', async () => {
    const good = csvWithBadLine17().replace(',-5,', ',300,');
    const reply = await editor.send('POST', `/api/workspaces/${wid}/fixtures/import`, { body: good, headers: { 'content-type': 'text/csv' } });
    expect(reply.status).toBe(200);
    expect(reply.body).toMatchObject({ created: 19, updated: 0 });
    const exported = await editor.get(`/api/workspaces/${wid}/fixtures/export`);
    expect(exported.headers.get('content-type')).toContain('text/csv');
    const [header, ...rows] = exported.text.trim().split('\r\n');
    expect(header).toBe(FIXTURE_CSV_COLUMNS.join(','));
    expect(rows.find((r) => r.startsWith('bulk-17,'))).toContain(',410,');
    // Importing the export again updates, and adds nothing.
    const round = await editor.send('POST', `/api/workspaces/${wid}/fixtures/import`, { body: exported.text, headers: { 'content-type': 'text/csv' } });
    expect(round.status).toBe(200);
    expect(round.body.created).toBe(0);
    expect(round.body.updated).toBe(rows.length);
  });

  it('answers a malformed id in a path with 404, not 500', async () => {
    expectError(await editor.get(`/api/workspaces/${wid}/fixtures/%27%20OR%201=1`), 404, 'not_found');
    expectError(await editor.get(`/api/workspaces/${'x'.repeat(200)}`), 404, 'not_found');
  });
});

describe('cross-site request forgery', () => {
  it('refuses a write without X-CSRF-Token with 403 csrf_failed', async () => {
    expectError(await editor.post(`/api/workspaces/${wid}/fixtures`, fixture, { noCsrf: true }), 403, 'csrf_failed');
  });

  it("refuses another session's token", async () => {
    const other = await app.signInAs('owner');
    expectError(await editor.send('POST', '/api/workspaces', { body: { name: 'x', currency: 'EUR' }, headers: { 'x-csrf-token': other.csrfToken ?? '' }, noCsrf: true }), 403, 'csrf_failed');
  });

  it('refuses an anonymous write without the visitor token', async () => {
    expectError(await app.client().post('/api/account/sign-up', { email: 'a@example.org', name: 'A', password: 'long-enough-pass' }, { noCsrf: true }), 403, 'csrf_failed');
  });
});
