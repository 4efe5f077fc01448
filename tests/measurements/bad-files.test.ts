import { describe, expect, it } from 'vitest';
import { DEFAULT_MAX_BYTES, parsePpfdGridCsv, parseSpectrumCsv } from '../../src/engine';
import type { FileProblem } from '../../src/engine';
import { spectrumCsv, wavelengths } from './spectra';

const problemsOf = (r: { ok: true } | { ok: false; problems: FileProblem[] }) => (r.ok ? [] : r.problems.map((p) => `${p.path}: ${p.message}`));
const grid = (text: string, maxBytes?: number) => problemsOf(parsePpfdGridCsv(text, maxBytes === undefined ? {} : { maxBytes }));
const spectrum = (text: string, maxBytes?: number) => problemsOf(parseSpectrumCsv(text, 'w', maxBytes === undefined ? {} : { maxBytes }));
const good = spectrumCsv(wavelengths(380, 780, 5), () => 0.01);

describe('a refused PPFD grid', () => {
  it('names the line of semicolon- or tab-separated values', () => {
    expect(grid('400;450\n500;600\n')).toEqual(['line 1: values are separated by semicolons; separate them with commas and write decimals with a point']);
    expect(grid('400,450\n500\t600\n')).toEqual(['line 2: values are separated by tabs; separate them with commas and write decimals with a point']);
  });

  it('names every non-numeric and empty cell with its line and column', () => {
    expect(grid('400,450\n500,abc\n600,\n')).toEqual(['line 2: column 2: "abc" is not a number', 'line 3: column 2 is empty']);
  });

  it('names a ragged row, counting against the first row', () => {
    expect(grid('400,450,500\n\n500,600\n')).toEqual(['line 3: has 2 values; line 1 has 3 (every canopy row needs the same count)']);
  });

  it('refuses an empty file, a blank one, and one over the size limit (2 MB, 2,000,000 bytes, by default)', () => {
    expect(grid('')).toEqual(['line 1: the file is empty']);
    expect(grid('\n  \n')).toEqual(['line 1: the file is empty']);
    expect(grid('400,450\n', 5)).toEqual(['(file): is 8 bytes; the limit is 5 bytes']);
    expect(DEFAULT_MAX_BYTES).toBe(2_000_000);
    expect(grid(`${'400,'.repeat(DEFAULT_MAX_BYTES / 4)}400\n`)[0]).toMatch(/^\(file\): is 2,000,004 bytes; the limit is 2,000,000 bytes$/);
  });

  it('counts the size in UTF-8 bytes, not characters', () => {
    expect(grid('x,y,µ\n', 6)).toEqual(['(file): is 7 bytes; the limit is 6 bytes']);
  });

  it('refuses a header that is not x, y, ppfd, a header alone, and negative readings', () => {
    expect(grid('a,b,c\n1,2,3\n')).toEqual(['line 1: the header must name exactly the columns x, y and ppfd (found "a", "b", "c")']);
    expect(grid('x,y,ppfd\n')).toEqual(['line 1: no readings follow the header']);
    expect(grid('400,-5\n')).toEqual(['line 1: column 2: -5 is negative; a PPFD reading is 0 or more']);
  });

  it('refuses x, y points that repeat or leave holes in the grid', () => {
    expect(grid('x,y,ppfd\n0,0,400\n1,0,450\n0,0,500\n1,1,300\n')).toEqual(['line 4: x 0, y 0 was already given on line 2']);
    expect(grid('x,y,ppfd\n0,0,400\n1,0,450\n0,1,500\n')).toEqual(['(file): the points do not fill a rectangular grid: no reading at x 1, y 1']);
  });

  it('refuses a grid of zeros, which has no light to summarise', () => {
    expect(grid('0,0\n0,0\n')).toEqual(['(file): every reading is 0; there is no light to summarise']);
  });
});

describe('a refused spectrum', () => {
  it('accepts the well-formed file these cases start from', () => {
    expect(spectrum(good)).toEqual([]);
  });

  it('names a missing header', () => {
    expect(spectrum(good.split('\n').slice(1).join('\n'))).toEqual([
      'line 1: the header is missing: the first line must name the columns, e.g. "wavelength_nm,value"',
    ]);
  });

  it('names semicolon-separated values with their line', () => {
    expect(spectrum(good.replace(/,/g, ';'))).toEqual(['line 1: values are separated by semicolons; separate them with commas and write decimals with a point']);
  });

  it('names non-numeric cells and ragged rows by line', () => {
    const lines = good.split('\n');
    lines[3] = '390,n/a';
    lines[5] = '400,0.01,7';
    expect(spectrum(lines.join('\n'))).toEqual(['line 4: column 2: "n/a" is not a number', 'line 6: has 3 values; the header has 2']);
  });

  it('names wavelengths that do not ascend', () => {
    const lines = good.split('\n');
    [lines[3], lines[4]] = [lines[4]!, lines[3]!];
    expect(spectrum(lines.join('\n'))).toEqual(['line 5: 390 nm does not follow 395 nm (line 4); wavelengths must ascend']);
  });

  it('names a step over 10 nm', () => {
    const text = spectrumCsv([...wavelengths(380, 500, 10), ...wavelengths(520, 780, 10)], () => 1);
    expect(spectrum(text)).toEqual(['line 15: a step of 20 nm from 500 nm (line 14); steps must be at most 10 nm']);
  });

  it('accepts steps of exactly 10 nm between decimal wavelengths, whose floating-point difference is a hair over 10', () => {
    const nm = Array.from({ length: 41 }, (_, i) => Number((392.2 + 10 * i).toFixed(1)));
    expect(512.2 - 502.2).toBeGreaterThan(10);
    expect(spectrum(spectrumCsv(nm, () => 0.01))).toEqual([]);
    expect(spectrum(spectrumCsv([...nm.slice(0, 12), 512.3, ...nm.slice(13)], () => 0.01))).toEqual([
      'line 14: a step of 10.1 nm from 502.2 nm (line 13); steps must be at most 10 nm',
    ]);
  });

  it('names a range that does not cover 400–700 nm at either end', () => {
    expect(spectrum(spectrumCsv(wavelengths(410, 690, 5), () => 1))).toEqual([
      'line 2: the data start at 410 nm; they must start at 400 nm or below to cover 400–700 nm',
      'line 58: the data stop at 690 nm; they must reach 700 nm or beyond to cover 400–700 nm',
    ]);
  });

  it('refuses an empty file, a header alone, one over the size limit and all zeros', () => {
    expect(spectrum('')).toEqual(['line 1: the file is empty']);
    expect(spectrum('wavelength_nm,value\n')).toEqual(['line 1: 0 readings follow the header; a spectrum needs at least 2']);
    expect(spectrum(good, 100)).toEqual([`(file): is ${good.length} bytes; the limit is 100 bytes`]);
    expect(spectrum(spectrumCsv(wavelengths(380, 780, 5), () => 0))).toEqual(['(file): every value over 400–700 nm is 0; there is no light to summarise']);
  });

  it('reports every problem of a file at once', () => {
    const lines = good.split('\n');
    lines[2] = '385,x';
    lines[9] = '420';
    lines[12] = '435,1,2';
    expect(spectrum(lines.join('\n'))).toHaveLength(3);
  });
});
