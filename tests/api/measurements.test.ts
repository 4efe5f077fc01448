import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { measurementDetailResponseSchema, measurementListResponseSchema, measurementResponseSchema } from '../../src/contracts/api/measurements';
import type { Measurement } from '../../src/contracts/api/measurements';
import { gridDocument, readPpfdGrid, readSpectrum, spectrumDocument } from '../../src/engine/measurements';
import { as } from '../../src/engine/units';
import type { SquareMetres, Watts } from '../../src/engine/units';
import { countMeasurements } from '../../server/repos/measurements';
import type { ApiClient } from '../helpers/api-client';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { spectrumCsv, wavelengths } from '../measurements/spectra';
import { GRID_3X3, PLANCK_2856, download, upload } from '../measurements/uploads';

let app: TestApp;
let owner: ApiClient;
let editor: ApiClient;
let viewer: ApiClient;
let wid = '';
const base = () => `/api/workspaces/${wid}/measurements`;

beforeAll(async () => {
  app = await startTestApp();
  owner = await app.signInAs('owner');
  editor = await app.signInAs('editor');
  viewer = await app.signInAs('viewer');
  wid = (await owner.get('/api/me')).body.memberships[0].workspaceId;
});
afterAll(async () => app?.close());

async function uploaded(c: ApiClient, fields: Record<string, string | number | undefined>, name: string, bytes: string): Promise<Measurement> {
  const reply = await upload(c, wid, fields, { name, bytes });
  expect(reply.status, reply.text).toBe(201);
  return measurementResponseSchema.parse(reply.body).measurement;
}

describe('uploading a PPFD grid', () => {
  it('stores it and answers with the engine’s figures: 3 × 3 of 400…800 → mean 600, min/mean 0.6667, min/max 0.5, CV 0.21517 (issue 5 worked example)', async () => {
    const m = await uploaded(owner, { kind: 'grid', label: 'Tent 1 at 30 cm', areaM2: 1.44, wallWatts: 320 }, 'tent-1.csv', GRID_3X3);
    const engine = readPpfdGrid(GRID_3X3, { areaM2: as<SquareMetres>(1.44), wallWatts: as<Watts>(320) });
    if (!engine.ok) throw new Error('the engine refused the worked example');
    expect(m.grid).toEqual(gridDocument(engine.value));
    expect(m.grid?.mean).toBe(600);
    expect(m.grid?.minOverMean).toBeCloseTo(0.6667, 4);
    expect(m.grid?.minOverMax).toBe(0.5);
    expect(m.grid?.cv).toBeCloseTo(0.21517, 5);
    expect(m.grid?.canopyFlux).toBeCloseTo(864, 9);
    expect(m.grid?.efficacyAtCanopy).toBeCloseTo(2.7, 9);
    expect(m).toMatchObject({ kind: 'grid', label: 'Tent 1 at 30 cm', fileName: 'tent-1.csv', unit: null, areaM2: 1.44, wallWatts: 320, spectrum: null });
    expect(m.sha256).toBe(createHash('sha256').update(GRID_3X3).digest('hex'));

    const detail = measurementDetailResponseSchema.parse((await viewer.get(`${base()}/${m.id}`)).body);
    expect(detail.data.cells).toEqual([[400, 450, 500], [550, 600, 650], [700, 750, 800]]);
  });

  it('lets every member download the raw file byte for byte, with its SHA-256 and a Content-Disposition', async () => {
    const bytes = '\uFEFFx (m),y (m),ppfd\r\n0,0,410\r\n0.6,0,455.5\r\n0,0.6,390\r\n0.6,0.6,502\r\n';
    const m = await uploaded(editor, { kind: 'grid' }, 'points é.csv', bytes);
    expect(m.label).toBe('points é.csv');
    const got = await download(viewer, wid, m.id);
    expect(got.status).toBe(200);
    expect(got.bytes.equals(Buffer.from(bytes, 'utf8'))).toBe(true);
    expect(createHash('sha256').update(got.bytes).digest('hex')).toBe(m.sha256);
    expect(got.headers.get('content-disposition')).toMatch(/^attachment; filename="points \?\.csv"; filename\*=UTF-8''points%20%C3%A9\.csv$/);
    expect(got.headers.get('repr-digest')).toBe(`sha-256=:${createHash('sha256').update(got.bytes).digest('base64')}:`);
  });
});

describe('uploading a spectrum', () => {
  it('answers with the engine’s figures; a Planckian radiator at 2856 K gives x 0.4476, y 0.4074, near CIE illuminant A (0.44757, 0.40745, CIE 15)', async () => {
    const m = await uploaded(owner, { kind: 'spectrum', unit: 'w', label: 'Tungsten reference' }, 'planck-2856.csv', PLANCK_2856);
    const engine = readSpectrum(PLANCK_2856, 'w');
    if (!engine.ok) throw new Error('the engine refused the Planckian spectrum');
    expect(m.spectrum).toEqual(spectrumDocument(engine.value));
    expect(m.spectrum?.cie1931?.x).toBeCloseTo(0.44757, 3);
    expect(m.spectrum?.cie1931?.y).toBeCloseTo(0.40745, 3);
    expect(m.spectrum?.cctK).toBeCloseTo(2856, 0);
    const detail = measurementDetailResponseSchema.parse((await owner.get(`${base()}/${m.id}`)).body);
    expect(detail.data.wavelengthNm).toEqual(engine.value.wavelengthNm);
    expect(detail.data.photons).toEqual(engine.value.photons);
  });

  it('counts readings below zero as 0 and keeps a note saying how many', async () => {
    const text = spectrumCsv(wavelengths(380, 780, 5), (nm) => (nm > 760 ? -0.004 : 0.2));
    const m = await uploaded(editor, { kind: 'spectrum', unit: 'umol' }, 'noisy.csv', text);
    expect(m.notes).toEqual(['4 readings were below zero (the lowest was -0.004) and were counted as 0, as instrument noise.']);
    expect(m.spectrum?.ppfd).toBeCloseTo(60, 9);
  });

  it('lists every measurement of the workspace, newest first', async () => {
    const list = measurementListResponseSchema.parse((await viewer.get(base())).body).measurements;
    expect(list.map((x) => x.fileName)).toEqual(['noisy.csv', 'planck-2856.csv', 'points é.csv', 'tent-1.csv']);
  });
});

describe('who may upload', () => {
  it('refuses a viewer with 403 and stores nothing', async () => {
    const before = await countMeasurements(app.m);
    const reply = await upload(viewer, wid, { kind: 'grid' }, { name: 'g.csv', bytes: GRID_3X3 });
    expect(reply.status).toBe(403);
    expect(reply.body.error.code).toBe('forbidden');
    expect(await countMeasurements(app.m)).toBe(before);
  });

  it('answers 404 to someone outside the workspace, for the list, an upload and a file', async () => {
    const outsider = await app.signUpAndIn('outsider@example.org');
    const [first] = measurementListResponseSchema.parse((await owner.get(base())).body).measurements;
    expect((await outsider.get(base())).status).toBe(404);
    expect((await upload(outsider, wid, { kind: 'grid' }, { name: 'g.csv', bytes: GRID_3X3 })).status).toBe(404);
    expect((await download(outsider, wid, first!.id)).status).toBe(404);
  });

  it('refuses an upload without the CSRF token', async () => {
    const saved = editor.csrfToken;
    editor.csrfToken = 'not-the-token';
    const reply = await upload(editor, wid, { kind: 'grid' }, { name: 'g.csv', bytes: GRID_3X3 });
    editor.csrfToken = saved;
    expect(reply.status).toBe(403);
    expect(reply.body.error.code).toBe('csrf_failed');
  });
});
