import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fixtureListResponseSchema, fixtureResponseSchema } from '../../src/contracts/api/fixtures';
import type { Fixture } from '../../src/contracts/api/fixtures';
import { applyMeasurementResponseSchema, measurementResponseSchema } from '../../src/contracts/api/measurements';
import type { Measurement } from '../../src/contracts/api/measurements';
import type { ApiClient } from '../helpers/api-client';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { GRID_3X3, PLANCK_2856, upload } from '../measurements/uploads';
import type { UploadFields } from '../measurements/uploads';

let app: TestApp;
let editor: ApiClient;
let viewer: ApiClient;
let wid = '';
let fixtures: Fixture[] = [];
const api = (path = '') => `/api/workspaces/${wid}${path}`;

beforeAll(async () => {
  app = await startTestApp();
  editor = await app.signInAs('editor');
  viewer = await app.signInAs('viewer');
  wid = (await editor.get('/api/me')).body.memberships[0].workspaceId;
  fixtures = fixtureListResponseSchema.parse((await editor.get(api('/fixtures'))).body).fixtures;
});
afterAll(async () => app?.close());

async function uploaded(fields: UploadFields, name: string, bytes: string): Promise<Measurement> {
  const reply = await upload(editor, wid, fields, { name, bytes });
  expect(reply.status, reply.text).toBe(201);
  return measurementResponseSchema.parse(reply.body).measurement;
}

const fixture = async (id: string) => fixtureResponseSchema.parse((await viewer.get(api(`/fixtures/${id}`))).body).fixture;

describe('feeding a library fixture from a measurement', () => {
  it('sets the fixture’s photonEfficacy to the grid’s efficacy at the canopy, marks it measured and links it', async () => {
    const target = fixtures[0]!;
    expect(target.dataSource).not.toBe('measured');
    const m = await uploaded({ kind: 'grid', areaM2: 1.44, wallWatts: 400, fixtureId: target.id }, 'tent.csv', GRID_3X3);
    expect(m.fixture).toEqual({ id: target.id, label: target.label });
    const reply = await editor.post(api(`/measurements/${m.id}/apply`), {});
    expect(reply.status, reply.text).toBe(200);
    const applied = applyMeasurementResponseSchema.parse(reply.body);
    // 600 µmol m⁻² s⁻¹ × 1.44 m² / 400 W = 2.16 µmol/J
    expect(applied.fixture.photonEfficacy).toBeCloseTo(2.16, 12);
    expect(applied.fixture.photonEfficacy).toBe(m.grid?.efficacyAtCanopy);
    expect(applied.fixture.ppf).toBeUndefined();
    expect(applied.measurement.feeds).toEqual([{ id: target.id, label: target.label }]);
    const stored = await fixture(target.id);
    expect(stored).toMatchObject({ dataSource: 'measured', measurementId: m.id, photonEfficacy: m.grid?.efficacyAtCanopy });
    expect(stored.label).toBe(target.label);
    expect(stored.wallWatts).toBe(target.wallWatts);
  });

  it('divides the canopy efficacy by the share of photons that landed on the measured area, and names a share out of range', async () => {
    const target = fixtures[5]!;
    const m = await uploaded({ kind: 'grid', areaM2: 1.44, wallWatts: 400 }, 'open-room.csv', GRID_3X3);
    for (const shareOnArea of [0, 1.2, 'most']) {
      const refused = await editor.post(api(`/measurements/${m.id}/apply`), { fixtureId: target.id, shareOnArea });
      expect(refused.status).toBe(400);
      expect(refused.body.error.fields.map((p: { path: string }) => p.path)).toEqual(['shareOnArea']);
    }
    expect((await fixture(target.id)).dataSource).toBe(target.dataSource);
    const reply = await editor.post(api(`/measurements/${m.id}/apply`), { fixtureId: target.id, shareOnArea: 0.8 });
    expect(reply.status, reply.text).toBe(200);
    // 600 µmol m⁻² s⁻¹ × 1.44 m² / 400 W = 2.16 µmol/J at the canopy; 2.16 / 0.8 = 2.7 µmol/J for the fixture.
    expect((await fixture(target.id)).photonEfficacy).toBeCloseTo(2.7, 12);
  });

  it('sets the fixture’s spectrum summary from a spectrum: the four shares and the CCT', async () => {
    const target = fixtures[1]!;
    const m = await uploaded({ kind: 'spectrum', unit: 'w' }, 'planck.csv', PLANCK_2856);
    const reply = await editor.post(api(`/measurements/${m.id}/apply`), { fixtureId: target.id });
    expect(reply.status, reply.text).toBe(200);
    const stored = await fixture(target.id);
    const s = m.spectrum!;
    expect(stored.spectrum).toEqual({ bluePct: s.sharesPct.blue, greenPct: s.sharesPct.green, redPct: s.sharesPct.red, farRedPct: s.sharesPct.farRed, cctK: s.cctK });
    expect(stored.dataSource).toBe('measured');
    expect(stored.measurementId).toBe(m.id);
    expect(stored.photonEfficacy ?? stored.ppf).toBe(target.photonEfficacy ?? target.ppf);
    const again = measurementResponseSchema.shape.measurement.parse((await viewer.get(api(`/measurements/${m.id}`))).body.measurement);
    expect(again.fixture).toEqual({ id: target.id, label: target.label });
  });

  it('refuses a grid without area and wall watts, naming what it needs, and changes nothing', async () => {
    const target = fixtures[2]!;
    const m = await uploaded({ kind: 'grid' }, 'bare.csv', GRID_3X3);
    const reply = await editor.post(api(`/measurements/${m.id}/apply`), { fixtureId: target.id });
    expect(reply.status).toBe(400);
    expect(reply.body.error.fields).toEqual([{ path: '(measurement)', message: 'needs areaM2 and wallWatts to give an efficacy at the canopy' }]);
    expect(await fixture(target.id)).toEqual(target);
  });

  it('refuses an efficacy above the physical limit through the fixture’s own rules', async () => {
    const target = fixtures[2]!;
    const m = await uploaded({ kind: 'grid', areaM2: 10, wallWatts: 100 }, 'impossible.csv', GRID_3X3);
    const reply = await editor.post(api(`/measurements/${m.id}/apply`), { fixtureId: target.id });
    expect(reply.status).toBe(400);
    expect(reply.body.error.fields).toEqual([{ path: 'photonEfficacy', message: 'must be at most 5.85 µmol/J, the physical limit for 400–700 nm' }]);
    expect(await fixture(target.id)).toEqual(target);
  });

  it('refuses a viewer with 403 and asks for a fixture when none is named', async () => {
    const m = await uploaded({ kind: 'grid', areaM2: 1, wallWatts: 300 }, 'v.csv', GRID_3X3);
    expect((await viewer.post(api(`/measurements/${m.id}/apply`), { fixtureId: fixtures[2]!.id })).status).toBe(403);
    const none = await editor.post(api(`/measurements/${m.id}/apply`));
    expect(none.status).toBe(400);
    expect(none.body.error.fields).toEqual([{ path: 'fixtureId', message: 'is required: this measurement names no fixture' }]);
  });

  it('keeps the measured figures but drops the link when the measurement is deleted', async () => {
    const target = fixtures[0]!;
    const before = await fixture(target.id);
    expect(before.measurementId).not.toBeNull();
    expect((await viewer.delete(api(`/measurements/${before.measurementId}`))).status).toBe(403);
    expect((await editor.delete(api(`/measurements/${before.measurementId}`))).status).toBe(403);
    const owner = await app.signInAs('owner');
    expect((await owner.delete(api(`/measurements/${before.measurementId}`))).status).toBe(204);
    const after = await fixture(target.id);
    expect(after.measurementId).toBeNull();
    expect(after.photonEfficacy).toBe(before.photonEfficacy);
    expect((await editor.get(api(`/measurements/${before.measurementId}`))).status).toBe(404);
  });
});
