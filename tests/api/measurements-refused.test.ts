import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MEASUREMENT_FILE_LIMIT } from '../../src/contracts/api/measurements';
import { countMeasurements } from '../../server/repos/measurements';
import type { ApiClient } from '../helpers/api-client';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';
import { spectrumCsv, wavelengths } from '../measurements/spectra';
import { GRID_3X3, upload } from '../measurements/uploads';
import type { UploadFields } from '../measurements/uploads';

let app: TestApp;
let editor: ApiClient;
let wid = '';

beforeAll(async () => {
  app = await startTestApp();
  editor = await app.signInAs('editor');
  wid = (await editor.get('/api/me')).body.memberships[0].workspaceId;
});
afterAll(async () => app?.close());

/** Uploads and returns the status and the error's fields; checks that no row was added. */
async function refused(fields: UploadFields, bytes: string | Uint8Array<ArrayBuffer> | null, name = 'bad.csv') {
  const before = await countMeasurements(app.m);
  const reply = await upload(editor, wid, fields, bytes === null ? null : { name, bytes });
  expect(await countMeasurements(app.m)).toBe(before);
  return { status: reply.status, code: reply.body?.error?.code, fields: reply.body?.error?.fields as { path: string; message: string }[] };
}

const spectrumLines = () => spectrumCsv(wavelengths(380, 780, 5), () => 0.01).split('\n');
const grid = { kind: 'grid' };
const spectrum = { kind: 'spectrum', unit: 'w' };

describe('a refused measurement file', () => {
  it('is answered 400 naming the line of values separated by semicolons, and nothing is stored', async () => {
    const r = await refused(grid, '400;450\n500;600\n');
    expect(r.status).toBe(400);
    expect(r.code).toBe('invalid_input');
    expect(r.fields).toEqual([{ path: 'file, line 1', message: 'values are separated by semicolons; separate them with commas and write decimals with a point' }]);
  });

  it('names a spectrum whose header is missing', async () => {
    const r = await refused(spectrum, spectrumLines().slice(1).join('\n'));
    expect(r.fields).toEqual([{ path: 'file, line 1', message: 'the header is missing: the first line must name the columns, e.g. "wavelength_nm,value"' }]);
  });

  it('names each non-numeric cell with its line and column', async () => {
    const r = await refused(grid, '400,450\n500,abc\n600,650\n');
    expect(r.fields).toEqual([{ path: 'file, line 2', message: 'column 2: "abc" is not a number' }]);
  });

  it('names a ragged row', async () => {
    const r = await refused(grid, '400,450,500\n500,600\n');
    expect(r.fields).toEqual([{ path: 'file, line 2', message: 'has 2 values; line 1 has 3 (every canopy row needs the same count)' }]);
  });

  it('names wavelengths that do not ascend', async () => {
    const lines = spectrumLines();
    [lines[3], lines[4]] = [lines[4]!, lines[3]!];
    const r = await refused(spectrum, lines.join('\n'));
    expect(r.fields).toEqual([{ path: 'file, line 5', message: '390 nm does not follow 395 nm (line 4); wavelengths must ascend' }]);
  });

  it('names a step over 10 nm', async () => {
    const r = await refused(spectrum, spectrumCsv([...wavelengths(380, 500, 10), ...wavelengths(520, 780, 10)], () => 1));
    expect(r.fields).toEqual([{ path: 'file, line 15', message: 'a step of 20 nm from 500 nm (line 14); steps must be at most 10 nm' }]);
  });

  it('names a range that does not cover 400–700 nm', async () => {
    const r = await refused(spectrum, spectrumCsv(wavelengths(410, 690, 5), () => 1));
    expect(r.fields).toEqual([
      { path: 'file, line 2', message: 'the data start at 410 nm; they must start at 400 nm or below to cover 400–700 nm' },
      { path: 'file, line 58', message: 'the data stop at 690 nm; they must reach 700 nm or beyond to cover 400–700 nm' },
    ]);
  });

  it('refuses an empty file', async () => {
    const r = await refused(grid, '');
    expect(r.status).toBe(400);
    expect(r.fields).toEqual([{ path: 'file, line 1', message: 'the file is empty' }]);
  });

  it('refuses a file that is not UTF-8 text', async () => {
    const r = await refused(grid, new Uint8Array([0x34, 0x30, 0x30, 0x2c, 0xff, 0xfe, 0x0a]));
    expect(r.fields).toEqual([{ path: 'file', message: 'is not UTF-8 text; save the file as CSV (UTF-8) and try again' }]);
  });

  it('is answered 400 naming the file when over 2 MB (2,000,000 bytes), and nothing is stored', async () => {
    const big = `${'400,'.repeat(MEASUREMENT_FILE_LIMIT / 4)}400\n`;
    const r = await refused(grid, big);
    expect(r.status).toBe(400);
    expect(r.code).toBe('invalid_input');
    expect(r.fields).toEqual([{ path: 'file', message: 'is larger than 2,000,000 bytes (2 MB), the limit for a measurement file' }]);
  });

  it('accepts a file of exactly 2 MB (2,000,000 bytes)', async () => {
    const row = '400,450,500,550,600,650,700,750,800,850\n';
    const rows = Math.floor(MEASUREMENT_FILE_LIMIT / row.length) - 1;
    // the last row's first reading padded with zeros ("000…0400" is 400) to fill the limit exactly
    const pad = MEASUREMENT_FILE_LIMIT - (rows + 1) * row.length;
    const text = row.repeat(rows) + '0'.repeat(pad) + row;
    expect(Buffer.byteLength(text)).toBe(MEASUREMENT_FILE_LIMIT);
    const r = await upload(editor, wid, grid, { name: 'big.csv', bytes: text });
    expect(r.status, r.text).toBe(201);
    expect(r.body.measurement.grid).toMatchObject({ rows: rows + 1, cols: 10, mean: 625 });
  });

  it('names every wrong field and every wrong line at once', async () => {
    const r = await refused({ kind: 'grid', areaM2: '-2', wallWatts: 'lots' }, '400,abc\n500,600,700\n');
    expect(r.fields).toEqual([
      { path: 'areaM2', message: 'must be greater than 0' },
      { path: 'wallWatts', message: 'must be a number' },
      { path: 'file, line 1', message: 'column 2: "abc" is not a number' },
      { path: 'file, line 2', message: 'has 3 values; line 1 has 2 (every canopy row needs the same count)' },
    ]);
    const s = await refused({ kind: 'spectrum' }, GRID_3X3);
    expect(s.fields).toEqual([
      { path: 'unit', message: 'is required for a spectrum: w, umol or relative' },
      { path: 'file, line 1', message: 'the header is missing: the first line must name the columns, e.g. "wavelength_nm,value"' },
    ]);
    const g = await refused({ kind: 'grid', unit: 'w' }, GRID_3X3);
    expect(g.fields).toEqual([{ path: 'unit', message: 'is only for spectra' }]);
  });

  it('asks for the file when none is sent, and refuses an unknown fixture', async () => {
    expect((await refused(grid, null)).fields).toEqual([{ path: 'file', message: 'is required: choose a CSV file to upload' }]);
    const r = await refused({ ...grid, fixtureId: 'no-such-fixture' }, GRID_3X3);
    expect(r.fields).toEqual([{ path: 'fixtureId', message: 'there is no such fixture in this workspace' }]);
  });

  it('refuses a JSON body with 415', async () => {
    const reply = await editor.post(`/api/workspaces/${wid}/measurements`, { kind: 'grid' });
    expect(reply.status).toBe(415);
  });
});
