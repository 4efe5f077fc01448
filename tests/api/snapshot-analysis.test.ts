import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisSettings } from '../../src/contracts/api/analysis';
import { snapshotResponseSchema } from '../../src/contracts/api/snapshots';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { demoScope, publish } from './snapshot-setup';
import type { DemoScope } from './snapshot-setup';

let app: TestApp;
let d: DemoScope;

const settings = (seed: string): AnalysisSettings => ({
  version: 1,
  sweep: { vary: 'led-bar-650', tariffLo: '0', tariffHi: '0.6', tariffN: '100', factorLo: '0.5', factorHi: '1.5', factorN: '100', showValueOf: 'led-bar-650' },
  swings: { pct: '20', measure: 'option', a: 'owned-hps-600', b: 'led-bar-650' },
  breakeven: { a: 'owned-hps-600', b: 'led-bar-650' },
  uncertainty: {
    seed,
    draws: '10000',
    inputs: [
      { path: 'electricity.pricePerKwh', low: '0.2', likely: '0.27', high: '0.35' },
      { path: 'discountRatePct', low: '3', likely: '5', high: '8' },
    ],
  },
});

const analysisPath = (wid: string, sid: string) => `/api/workspaces/${wid}/scenarios/${sid}/analysis`;

/** A new scenario with the demo scenario's document and no kept settings; its id. */
async function newScenario(): Promise<string> {
  const document = (await d.editor.get(`/api/workspaces/${d.wid}/scenarios/${d.sid}`)).body.scenario.document;
  const created = await d.editor.post(`/api/workspaces/${d.wid}/scenarios`, { document });
  expect(created.status).toBe(201);
  return created.body.scenario.id as string;
}

async function readSnapshot(id: string) {
  const reply = await app.client().get(`/api/snapshots/${id}`);
  expect(reply.status).toBe(200);
  return snapshotResponseSchema.parse(reply.body).snapshot;
}

beforeAll(async () => {
  app = await startTestApp();
  d = await demoScope(app);
});
afterAll(async () => app?.close());

describe('sensitivity settings travel with copies and snapshots', () => {
  it('when a scenario is duplicated, the copy keeps the same settings and seed, and the two stay separate afterwards', async () => {
    expect((await d.editor.put(analysisPath(d.wid, d.sid), { settings: settings('3141592653') })).status).toBe(200);
    const copy = await d.editor.post(`/api/workspaces/${d.wid}/scenarios/${d.sid}/duplicate`, { title: 'Copy with its settings' });
    expect(copy.status).toBe(201);
    const copyId = copy.body.scenario.id as string;
    const kept = await d.editor.get(analysisPath(d.wid, copyId));
    expect(kept.body.settings).toEqual(settings('3141592653'));
    await d.editor.put(analysisPath(d.wid, copyId), { settings: settings('1') });
    expect((await d.editor.get(analysisPath(d.wid, d.sid))).body.settings.uncertainty.seed).toBe('3141592653');
  });

  it('when a scenario with no kept settings is duplicated, the copy has none either', async () => {
    const bare = await newScenario();
    const copy = await d.editor.post(`/api/workspaces/${d.wid}/scenarios/${bare}/duplicate`, {});
    expect(copy.status).toBe(201);
    expect((await d.editor.get(analysisPath(d.wid, copy.body.scenario.id))).body).toEqual({ settings: null, updatedAt: null });
  });

  it('freezes the settings into a snapshot: later changes to the kept settings leave it as published', async () => {
    await d.editor.put(analysisPath(d.wid, d.sid), { settings: settings('2718281828') });
    const published = await publish(d.editor, d.wid, d.sid);
    await d.editor.put(analysisPath(d.wid, d.sid), { settings: settings('99') });
    const snapshot = await readSnapshot(published.id);
    expect(snapshot.analysis).toEqual(settings('2718281828'));
    expect((await readSnapshot(published.id)).analysis?.uncertainty.seed).toBe('2718281828');
  });

  it('keeps the input hash over the scenario alone: snapshots with and without settings of one revision have the same hash', async () => {
    const without = await publish(d.editor, d.wid, await newScenario());
    const withSettings = await publish(d.editor, d.wid, d.sid);
    expect((await readSnapshot(without.id)).analysis).toBeUndefined();
    expect((await readSnapshot(withSettings.id)).analysis).toBeDefined();
    expect(withSettings.inputHash).toBe(without.inputHash);
  });

  it('refuses to change the frozen settings in the database itself (the snapshots trigger)', async () => {
    const published = await publish(d.editor, d.wid, d.sid);
    const refusal = await app.running.sequelize.query('UPDATE snapshots SET analysis = NULL WHERE id = ?', { replacements: [published.id] }).then(
      () => 'accepted',
      (e: { parent?: Error }) => e.parent?.message ?? String(e),
    );
    expect(refusal).toMatch(/snapshots are immutable/);
    expect((await readSnapshot(published.id)).analysis).toBeDefined();
  });

  it('when a snapshot is forked, the new scenario keeps the frozen settings with the same seed', async () => {
    await d.editor.put(analysisPath(d.wid, d.sid), { settings: settings('1618033988') });
    const published = await publish(d.editor, d.wid, d.sid);
    const reader = await app.signUpAndIn('settings-reader@example.org', 'Settings Reader');
    const ws = await reader.post('/api/workspaces', { name: 'Reruns', currency: 'EUR' });
    const wid = ws.body.workspace.id as string;
    const fork = await reader.post(`/api/snapshots/${published.id}/fork`, { workspaceId: wid });
    expect(fork.status).toBe(201);
    const kept = await reader.get(analysisPath(wid, fork.body.scenario.id));
    expect(kept.status).toBe(200);
    expect(kept.body.settings).toEqual(settings('1618033988'));
  });

  it('when a snapshot without settings is forked, the new scenario has none', async () => {
    const published = await publish(d.editor, d.wid, await newScenario());
    const fork = await d.editor.post(`/api/snapshots/${published.id}/fork`, { workspaceId: d.wid });
    expect(fork.status).toBe(201);
    expect((await d.editor.get(analysisPath(d.wid, fork.body.scenario.id))).body).toEqual({ settings: null, updatedAt: null });
  });
});

describe('migration 0008-snapshot-analysis', () => {
  it('keeps the trigger that refuses UPDATE when the column is removed and added again (SQLite recopies tables on removeColumn)', async () => {
    const { migrator } = await import('../../server/db/migrate');
    const sequelize = app.running.sequelize;
    const triggerCount = async () => {
      if (sequelize.getDialect() === 'postgres') {
        const [rows] = await sequelize.query("SELECT tgname FROM pg_trigger WHERE tgname = 'snapshots_immutable'");
        return rows.length;
      }
      const [rows] = await sequelize.query("SELECT name FROM sqlite_master WHERE type = 'trigger' AND name = 'snapshots_immutable'");
      return rows.length;
    };
    await migrator(sequelize).down({ to: '0008-snapshot-analysis' });
    await expect(sequelize.query('SELECT analysis FROM snapshots')).rejects.toThrow();
    expect(await triggerCount()).toBe(1);
    await migrator(sequelize).up();
    expect(await triggerCount()).toBe(1);
    const published = await publish(d.editor, d.wid, d.sid);
    expect((await readSnapshot(published.id)).analysis).toBeDefined();
  });
});
