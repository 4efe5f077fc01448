import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { scenarioResponseSchema } from '../../src/contracts/api/scenarios';
import { snapshotResponseSchema } from '../../src/contracts/api/snapshots';
import type { PublicSnapshot } from '../../src/contracts/api/snapshots';
import { parseScenario, scenarioHash } from '../../src/engine';
import { pdfMoney } from '../../src/lib/report/report-format';
import { SNAPSHOT_MAILS_PER_HOUR } from '../../server/routes/snapshots-limits';
import { linkIn } from '../helpers/caught-mail';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { pdfText } from '../support/pdf-text';
import { demoScope, publish } from './snapshot-setup';
import type { DemoScope } from './snapshot-setup';

let app: TestApp;
let d: DemoScope;
let id: string;
let snapshot: PublicSnapshot;
beforeAll(async () => {
  app = await startTestApp();
  d = await demoScope(app);
  id = (await publish(d.editor, d.wid, d.sid, { notes: 'Options for the board meeting.' })).id;
  snapshot = snapshotResponseSchema.parse((await app.client().get(`/api/snapshots/${id}`)).body).snapshot;
});
afterAll(async () => app?.close());

/** Splits CSV text into rows of cells (RFC 4180 quoting). */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted && c === '"' && text[i + 1] === '"') {
      cell += '"';
      i++;
    } else if (c === '"') {
      quoted = !quoted;
    } else if (!quoted && c === ',') {
      row.push(cell);
      cell = '';
    } else if (!quoted && c === '\n') {
      row.push(cell);
      rows.push(row);
      row = [];
      cell = '';
    } else if (quoted || c !== '\r') {
      cell += c;
    }
  }
  return rows;
}

describe('forking a snapshot', () => {
  it('copies it into a workspace of the signed-in reader as a new scenario that remembers its origin', async () => {
    const reader = await app.signUpAndIn('reviewer@example.org', 'Review Reader');
    const ws = await reader.post('/api/workspaces', { name: 'My reviews', currency: 'EUR' });
    expect(ws.status).toBe(201);
    const wid = ws.body.workspace.id as string;
    const fork = await reader.post(`/api/snapshots/${id}/fork`, { workspaceId: wid });
    expect(fork.status).toBe(201);
    const record = scenarioResponseSchema.parse(fork.body).scenario;
    expect(record.workspaceId).toBe(wid);
    expect(record.revision).toBe(1);
    expect(scenarioHash(record.document)).toBe(snapshot.inputHash);
    const origin = await reader.get(`/api/workspaces/${wid}/scenarios/${record.id}/snapshots`);
    expect(origin.body.forkedFrom).toEqual({ snapshotId: id, forkedAt: expect.any(String) });
  });

  it('refuses a workspace where the reader only views (403), one they are not in (404), and a reader who is not signed in (401)', async () => {
    const viewer = await app.signInAs('viewer');
    expect((await viewer.post(`/api/snapshots/${id}/fork`, { workspaceId: d.wid })).status).toBe(403);
    const outsider = await app.signUpAndIn('not-a-member@example.org');
    expect((await outsider.post(`/api/snapshots/${id}/fork`, { workspaceId: d.wid })).status).toBe(404);
    expect((await app.client().post(`/api/snapshots/${id}/fork`, { workspaceId: d.wid })).status).toBe(401);
  });
});

describe('downloads', () => {
  it('gives the scenario file, which parses again as photon-parity/scenario@1 with the same input hash', async () => {
    const reply = await app.client().get(`/api/snapshots/${id}/scenario.json`);
    expect(reply.status).toBe(200);
    expect(reply.headers.get('content-disposition')).toMatch(/attachment; filename=".+\.scenario\.json"/);
    const checked = parseScenario(JSON.parse(reply.text));
    expect(checked.ok).toBe(true);
    if (checked.ok) expect(scenarioHash(checked.value)).toBe(snapshot.inputHash);
  });

  it('gives the totals as CSV, one line per option, with the present values digit for digit', async () => {
    const reply = await app.client().get(`/api/snapshots/${id}/totals.csv`);
    expect(reply.headers.get('content-type')).toMatch(/text\/csv/);
    const [header, ...lines] = parseCsv(reply.text);
    expect(lines.length).toBe(snapshot.result.options.length);
    const col = (name: string) => header!.indexOf(name);
    for (const o of snapshot.result.options) {
      const line = lines.find((l) => l[col('option_id')] === o.id)!;
      expect(line[col('total_present_value')]).toBe(o.totalPresentValue);
      expect(line[col('total_nominal')]).toBe(o.totalNominal);
      expect(line[col('lowest_present_value')]).toBe(String(o.id === snapshot.result.cheapest));
    }
  });

  it('gives the yearly ledger as CSV, whose year totals add up to each running total', async () => {
    const [header, ...lines] = parseCsv((await app.client().get(`/api/snapshots/${id}/ledger.csv`)).text);
    const rows = snapshot.result.options.reduce((n, o) => n + o.years.length, 0);
    expect(lines.length).toBe(rows);
    const last = snapshot.result.options[0]!.years.at(-1)!;
    const line = lines.find((l) => l[0] === snapshot.result.options[0]!.id && l[header!.indexOf('year')] === String(last.year))!;
    expect(line[header!.indexOf('cumulative')]).toBe(last.cumulative);
  });

  it('gives the PDF report; its text holds the title, every total, the link and the input hash', async () => {
    const reply = await fetch(`${app.base}/api/snapshots/${id}/report.pdf`);
    expect(reply.headers.get('content-type')).toBe('application/pdf');
    const text = (await pdfText(new Uint8Array(await reply.arrayBuffer()))).replace(/\s+/g, ' ');
    expect(text).toContain(snapshot.title);
    for (const o of snapshot.result.options) expect(text).toContain(pdfMoney(o.totalPresentValue, snapshot.scenario.currency));
    expect(text).toContain(`/s/${id}`);
    expect(text).toContain(snapshot.inputHash);
    expect(text).toContain('the figures reproduce');
    expect(text).toContain('Options for the board meeting.');
  });
});

describe('sending the link by e-mail', () => {
  it('mails each address the link and the note through the fake SMTP server', async () => {
    const reply = await d.editor.post(`/api/workspaces/${d.wid}/snapshots/${id}/send`, { to: ['client.one@example.org', 'Client.Two@example.org'], note: 'Here are the options we discussed.' });
    expect(reply.status).toBe(200);
    expect(reply.body.sent).toEqual(['client.one@example.org', 'client.two@example.org']);
    for (const address of reply.body.sent as string[]) {
      const mail = await app.mail.latestTo(address);
      expect(mail.to).toEqual([address]);
      expect(linkIn(mail, `/s/${id}`)).toBe(`${app.base}/s/${id}`);
      expect(mail.text).toContain('Here are the options we discussed.');
    }
  });

  it('names bad addresses and refuses a viewer', async () => {
    const bad = await d.editor.post(`/api/workspaces/${d.wid}/snapshots/${id}/send`, { to: ['not-an-address'] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual([{ path: 'to[0]', message: 'must be an e-mail address' }]);
    const viewer = await app.signInAs('viewer');
    expect((await viewer.post(`/api/workspaces/${d.wid}/snapshots/${id}/send`, { to: ['x@example.org'] })).status).toBe(403);
  });

  it(`is rate limited: after ${SNAPSHOT_MAILS_PER_HOUR} sends in an hour the next is refused with 429`, async () => {
    const owner = await app.signInAs('owner');
    const codes: number[] = [];
    for (let i = 0; i <= SNAPSHOT_MAILS_PER_HOUR; i++) codes.push((await owner.post(`/api/workspaces/${d.wid}/snapshots/${id}/send`, { to: [] })).status);
    expect(codes.slice(0, SNAPSHOT_MAILS_PER_HOUR).every((c) => c === 400)).toBe(true);
    expect(codes.at(-1)).toBe(429);
  });
});

describe('bad input', () => {
  it('never answers 500, whatever the path or body', async () => {
    const anyone = app.client();
    const owner = await app.signInAs('owner');
    const probes: Array<Promise<{ status: number }>> = [
      anyone.get('/api/snapshots/short'),
      anyone.get(`/api/snapshots/${'x'.repeat(64)}`),
      anyone.get(`/api/snapshots/${'%'.repeat(3)}`),
      anyone.get(`/api/snapshots/${id}/nothing-here`),
      anyone.get('/s/..%2F..%2Fetc'),
      owner.post(`/api/workspaces/${d.wid}/scenarios/${d.sid}/snapshots`, '{not json', { headers: { 'content-type': 'application/json' } }),
      owner.post(`/api/workspaces/${d.wid}/scenarios/${d.sid}/snapshots`, { notes: 42, expiresAt: 'soon' }),
      owner.post(`/api/workspaces/${d.wid}/scenarios/${d.sid}/snapshots`, { notes: 'x'.repeat(5000) }),
      owner.post(`/api/workspaces/${d.wid}/scenarios/nope/snapshots`, {}),
      owner.patch(`/api/workspaces/${d.wid}/snapshots/${id}`, { expiresAt: 12 }),
      owner.patch(`/api/workspaces/${d.wid}/snapshots/${id}`, []),
      owner.patch(`/api/workspaces/${d.wid}/snapshots/not-a-snapshot`, { expiresAt: null }),
      owner.post(`/api/workspaces/${d.wid}/snapshots/${id}/revoke`, { extra: true }),
      owner.post(`/api/snapshots/${id}/fork`, { workspaceId: '../x' }),
      owner.post(`/api/snapshots/${id}/fork`, { workspaceId: d.wid, title: '' }),
      owner.post('/api/snapshots/AAAAAAAAAAAAAAAAAAAAA/fork', { workspaceId: d.wid }),
    ];
    const statuses = (await Promise.all(probes)).map((r) => r.status);
    expect(statuses.every((s) => s >= 400 && s < 500), statuses.join(',')).toBe(true);
  });
});
