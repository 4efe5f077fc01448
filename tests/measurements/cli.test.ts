import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { planck, spectrumCsv, wavelengths } from './spectra';

const root = fileURLToPath(new URL('../../', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'pp-measurements-'));
const file = (name: string, text: string) => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};
const cli = (...args: string[]) => {
  const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
};

const grid = file('grid.csv', '400,450,500\n550,600,650\n700,750,800\n');
const illuminantA = file('a.csv', spectrumCsv(wavelengths(360, 830, 1), (nm) => planck(nm, 2856)));

describe('cli grid', () => {
  it('prints exactly the fields of photon-parity/grid@1 with --json (3 × 3 worked example of issue 5)', () => {
    const r = cli('grid', grid, '--area-m2', '1.44', '--wall-watts', '600', '--json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(Object.keys(doc)).toEqual(['format', 'rows', 'cols', 'count', 'mean', 'min', 'max', 'minOverMean', 'minOverMax', 'cv', 'canopyFlux', 'efficacyAtCanopy']);
    expect(doc.format).toBe('photon-parity/grid@1');
    expect(doc.mean).toBe(600);
    expect(doc.cv).toBeCloseTo(0.21517, 5);
    expect(doc.canopyFlux).toBeCloseTo(864, 9);
    expect(doc.efficacyAtCanopy).toBeCloseTo(1.44, 9);
  });

  it('prints a readable table without --json', () => {
    const r = cli('grid', grid);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/mean PPFD\s+600\.0/);
    expect(r.stdout).toMatch(/coefficient of variation\s+21\.5 %/);
  });

  it('exits 2 with one line per problem naming the file line, and no stack trace', () => {
    const r = cli('grid', file('bad.csv', '400,450\n500,abc\n1,2,3\n'), '--json');
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toEqual([
      `${join(dir, 'bad.csv')}, line 2: column 2: "abc" is not a number`,
      `${join(dir, 'bad.csv')}, line 3: has 3 values; line 1 has 2 (every canopy row needs the same count)`,
    ]);
  });

  it('exits 2 for wall watts without an area and for a flag that is not a positive number', () => {
    expect(cli('grid', grid, '--wall-watts', '600').code).toBe(2);
    const r = cli('grid', grid, '--area-m2=-1');
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toBe('--area-m2: must be a number greater than 0');
  });
});

describe('cli spectrum', () => {
  it('prints exactly the fields of photon-parity/spectrum@1 with --json (Planckian 2856 K ≈ CIE illuminant A, CIE 15:2018)', () => {
    const r = cli('spectrum', illuminantA, '--unit', 'relative', '--json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(Object.keys(doc)).toEqual(['format', 'ppfd', 'sharesPct', 'cie1931', 'cctK', 'ypfdRatio', 'redFarRedRatio']);
    expect(Object.keys(doc.sharesPct)).toEqual(['blue', 'green', 'red', 'farRed']);
    expect(doc.format).toBe('photon-parity/spectrum@1');
    expect(doc.ppfd).toBeNull();
    expect(doc.cie1931.x).toBeCloseTo(0.44754, 5);
    expect(doc.cctK).toBeCloseTo(2856, 0);
    expect(doc.sharesPct.blue + doc.sharesPct.green + doc.sharesPct.red).toBeCloseTo(100, 10);
  });

  it('prints a readable table without --json', () => {
    const r = cli('spectrum', illuminantA, '--unit', 'w');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/correlated colour temperature\s+2856 K/);
  });

  it('exits 2 naming the line of a bad file, and for a missing or unknown unit', () => {
    const r = cli('spectrum', file('semi.csv', 'nm;value\n400;1\n700;1\n'), '--unit', 'w');
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toBe(`${join(dir, 'semi.csv')}, line 1: values are separated by semicolons; separate them with commas and write decimals with a point`);
    expect(cli('spectrum', illuminantA).code).toBe(2);
    expect(cli('spectrum', illuminantA, '--unit', 'lux').stderr.trim()).toMatch(/^--unit: must be one of w, umol, relative/);
  });
});
