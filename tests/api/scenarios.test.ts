import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { scenarioListResponseSchema, scenarioResponseSchema, revisionListResponseSchema } from '../../src/contracts/api/scenarios';
import { scenarioResultResponseSchema } from '../../src/contracts/api/result';
import { computeScenario } from '../../src/engine';
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

const base = () => `/api/workspaces/${wid}/scenarios`;

describe('scenarios', () => {
  it('holds the two demo scenarios and the demo fixture library', async () => {
    const list = scenarioListResponseSchema.parse((await editor.get(base())).body);
    expect(list.total).toBe(2);
    expect(list.items.map((s) => s.title).join(' | ')).toContain('Room A');
    const fixtures = (await editor.get(`/api/workspaces/${wid}/fixtures`)).body.fixtures;
    // Four options in room A and three in room B, all with distinct ids.
    expect(fixtures).toHaveLength(7);
    expect(fixtures.every((f: { dataSource: string }) => f.dataSource === 'estimate')).toBe(true);
  });

  it('saves with If-Match, records the changed field paths, and refuses a stale revision with 409', async () => {
    const created = scenarioResponseSchema.parse((await editor.post(base(), { document: sampleScenario('Revision test') })).body).scenario;
    expect(created.revision).toBe(1);
    const edited = structuredClone(created.document);
    edited.electricity.pricePerKwh = '0.31';
    edited.options[1]!.wallWatts = 520;
    const saved = await editor.put(`${base()}/${created.id}`, { document: edited }, { headers: { 'if-match': '1' } });
    expect(saved.status).toBe(200);
    expect(saved.headers.get('etag')).toBe('"2"');
    expect(saved.body.scenario.revision).toBe(2);

    const stale = await editor.put(`${base()}/${created.id}`, { document: created.document }, { headers: { 'if-match': '1' } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.error.fields).toEqual([{ path: 'revision', message: 'current revision is 2' }]);
    expect(stale.body.error.message).toContain('current one is 2');

    const missing = await editor.put(`${base()}/${created.id}`, { document: edited });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields[0].path).toBe('If-Match');

    const history = revisionListResponseSchema.parse((await editor.get(`${base()}/${created.id}/revisions`)).body).revisions;
    expect(history.map((r) => r.revision)).toEqual([2, 1]);
    expect(history[0]).toMatchObject({ action: 'edited', changedPaths: ['electricity.pricePerKwh', 'options[1].wallWatts'] });
    expect(history[0]?.createdBy.name).toBe('Pim Okonkwo-Lathe');

    const restored = await editor.post(`${base()}/${created.id}/revisions/1/restore`);
    expect(restored.status).toBe(200);
    expect(restored.body.scenario).toMatchObject({ revision: 3, document: created.document });
    const old = await editor.get(`${base()}/${created.id}/revisions/2`);
    expect(old.body.revision.document.electricity.pricePerKwh).toBe('0.31');
  });

  it('keeps revisions append-only in the database itself', async () => {
    const error = (await app.m.sequelize.query("UPDATE scenario_revisions SET title = 'changed'").catch((e: unknown) => e)) as { parent?: Error };
    expect(error.parent?.message).toMatch(/append-only/);
  });

  it('computes the result on the server from the stored document', async () => {
    const created = (await editor.post(base(), { document: sampleScenario('Result test') })).body.scenario;
    const reply = scenarioResultResponseSchema.parse((await editor.get(`${base()}/${created.id}/result`)).body);
    expect(reply.result).toEqual(computeScenario(sampleScenario('Result test')));
    // Spec rule n = T × A / (Φ × U × M): 600 × 8 / (1.2 × 600) for option a (docs: scenario-format.md).
    expect(reply.result.options[0]?.fixturesExact).toBeCloseTo((600 * 8) / (1.2 * 600), 9);
  });

  it('computes afresh when the stored document changes under an unchanged revision number (a restored backup)', async () => {
    const created = (await editor.post(base(), { document: sampleScenario('Restored later') })).body.scenario;
    const first = scenarioResultResponseSchema.parse((await editor.get(`${base()}/${created.id}/result`)).body);
    const original = sampleScenario('Restored later');
    const restored = { ...original, electricity: { ...original.electricity, pricePerKwh: '0.05' } };
    await app.running.sequelize.query('UPDATE scenarios SET document = ? WHERE id = ?', { replacements: [JSON.stringify(restored), created.id] });
    const second = scenarioResultResponseSchema.parse((await editor.get(`${base()}/${created.id}/result`)).body);
    expect(second.revision).toBe(first.revision);
    expect(second.result).toEqual(computeScenario(restored));
    expect(second.result).not.toEqual(first.result);
  });

  it('duplicates a scenario with a new title and its own history', async () => {
    const created = (await editor.post(base(), { document: sampleScenario('Original') })).body.scenario;
    const copy = await editor.post(`${base()}/${created.id}/duplicate`, { title: 'Copy for the client' });
    expect(copy.status).toBe(201);
    expect(copy.body.scenario).toMatchObject({ title: 'Copy for the client', revision: 1 });
    expect(copy.body.scenario.document.title).toBe('Copy for the client');
    const history = (await editor.get(`${base()}/${copy.body.scenario.id}/revisions`)).body.revisions;
    expect(history).toEqual([expect.objectContaining({ action: 'duplicated', fromRevision: 1 })]);
  });

  it('searches titles and pages the list', async () => {
    for (let i = 0; i < 5; i++) await editor.post(base(), { document: sampleScenario(`Paging 50% room ${i}`) });
    const page1 = scenarioListResponseSchema.parse((await editor.get(`${base()}?q=${encodeURIComponent('50% room')}&pageSize=2`)).body);
    expect(page1.total).toBe(5);
    expect(page1.items).toHaveLength(2);
    const page3 = scenarioListResponseSchema.parse((await editor.get(`${base()}?q=${encodeURIComponent('50% ROOM')}&pageSize=2&page=3`)).body);
    expect(page3.items).toHaveLength(1);
    const none = scenarioListResponseSchema.parse((await editor.get(`${base()}?q=${encodeURIComponent("' OR 1=1 --")}`)).body);
    expect(none.total).toBe(0);
  });

  it('lets only an owner delete a scenario, which then is hidden while its history rows stay', async () => {
    const created = (await editor.post(base(), { document: sampleScenario('To delete') })).body.scenario;
    expect((await editor.delete(`${base()}/${created.id}`)).status).toBe(403);
    const owner = await app.signInAs('owner');
    expect((await owner.delete(`${base()}/${created.id}`)).status).toBe(204);
    expect((await editor.get(`${base()}/${created.id}`)).status).toBe(404);
    expect(await app.m.Revision.count({ where: { scenarioId: created.id } })).toBe(1);
  });
});
