import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisSettings } from '../../src/contracts/api/analysis';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

let app: TestApp;
let wid: string;
let sid: string;

const settings = (seed: string): AnalysisSettings => ({
  version: 1,
  sweep: { vary: 'led-bar-650', tariffLo: '0', tariffHi: '0.6', tariffN: '100', factorLo: '0.5', factorHi: '1.5', factorN: '100', showValueOf: 'led-bar-650' },
  swings: { pct: '20', measure: 'option', a: 'owned-hps-600', b: 'led-bar-650' },
  breakeven: { a: 'owned-hps-600', b: 'led-bar-650' },
  uncertainty: { seed, draws: '10000', inputs: [{ path: 'electricity.pricePerKwh', low: '0.2', likely: '0.27', high: '0.35' }] },
});

beforeAll(async () => {
  app = await startTestApp();
  const owner = await app.signInAs('owner');
  const me = await owner.get('/api/me');
  wid = me.body.memberships[0].workspaceId;
  const list = await owner.get(`/api/workspaces/${wid}/scenarios`);
  sid = list.body.items.find((s: { title: string }) => s.title.includes('Room A')).id;
});
afterAll(async () => app?.close());

describe('analysis settings kept with a scenario', () => {
  it('starts empty, and keeps what an editor saves (the uncertainty seed included) for every member to read', async () => {
    const editor = await app.signInAs('editor');
    const path = `/api/workspaces/${wid}/scenarios/${sid}/analysis`;
    expect((await editor.get(path)).body).toEqual({ settings: null, updatedAt: null });
    const saved = await editor.put(path, { settings: settings('12345') });
    expect(saved.status).toBe(200);
    const viewer = await app.signInAs('viewer');
    const read = await viewer.get(path);
    expect(read.body.settings.uncertainty.seed).toBe('12345');
    expect(read.body.updatedAt).toEqual(expect.any(String));
    await editor.put(path, { settings: settings('777') });
    expect((await viewer.get(path)).body.settings.uncertainty.seed).toBe('777');
  });

  it('does not bump the scenario revision when settings are saved', async () => {
    const editor = await app.signInAs('editor');
    const before = (await editor.get(`/api/workspaces/${wid}/scenarios/${sid}`)).body.scenario.revision;
    await editor.put(`/api/workspaces/${wid}/scenarios/${sid}/analysis`, { settings: settings('9') });
    expect((await editor.get(`/api/workspaces/${wid}/scenarios/${sid}`)).body.scenario.revision).toBe(before);
  });

  it('refuses a viewer with 403, an outsider with 404, and bad settings with 400 naming the field', async () => {
    const path = `/api/workspaces/${wid}/scenarios/${sid}/analysis`;
    const viewer = await app.signInAs('viewer');
    expect((await viewer.put(path, { settings: settings('1') })).status).toBe(403);
    const outsider = await app.signUpAndIn('someone-else@example.invalid');
    expect((await outsider.get(path)).status).toBe(404);
    const editor = await app.signInAs('editor');
    const bad = await editor.put(path, { settings: { ...settings('1'), uncertainty: { seed: 5, draws: '1', inputs: [] } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual([{ path: 'settings.uncertainty.seed', message: 'must be text' }]);
  });
});
