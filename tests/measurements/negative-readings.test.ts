import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readSpectrum } from '../../src/engine';
import type { SpectrumSummary } from '../../src/engine';
import { line, spectrumCsv, wavelengths } from './spectra';

const read = (text: string): SpectrumSummary => {
  const r = readSpectrum(text, 'umol');
  if (!r.ok) throw new Error(r.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return r.value;
};
const nm = wavelengths(380, 780, 5);
const led = (at: number) => line(at, 450, 20) + 2 * line(at, 660, 20);
const figures = ({ notes: _n, clampedReadings: _c, ...rest }: SpectrumSummary) => rest;

describe('a spectrum with readings below zero', () => {
  it('counts each reading below zero as 0 and says how many there were, instead of refusing the file', () => {
    const noisy = spectrumCsv(nm, (at) => (at > 740 ? -0.002 : led(at)));
    const zeroed = spectrumCsv(nm, (at) => (at > 740 ? 0 : led(at)));
    const s = read(noisy);
    expect(s.clampedReadings).toBe(8);
    expect(s.notes).toEqual(['8 readings were below zero (the lowest was -0.002) and were counted as 0, as instrument noise.']);
    expect(figures(s)).toEqual(figures(read(zeroed)));
    expect(Math.min(...s.photons)).toBe(0);
  });

  it('has no note when every reading is 0 or more', () => {
    const s = read(spectrumCsv(nm, led));
    expect(s.clampedReadings).toBe(0);
    expect(s.notes).toEqual([]);
  });

  it('says "reading was" for a single one', () => {
    const s = read(spectrumCsv(nm, (at) => (at === 780 ? -1e-4 : led(at))));
    expect(s.notes).toEqual(['1 reading was below zero (the lowest was -0.0001) and was counted as 0, as instrument noise.']);
  });

  it('never lets noise below zero raise a band share or the PPFD (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: nm.length - 1 }), { maxLength: 20 }), fc.double({ min: -5, max: -1e-9, noNaN: true }), (at, noise) => {
        const marked = new Set(at.map((i) => nm[i]));
        const noisy = read(spectrumCsv(nm, (x) => (marked.has(x) ? noise : led(x))));
        const clean = read(spectrumCsv(nm, led));
        expect(noisy.clampedReadings).toBe(marked.size);
        expect(noisy.ppfd ?? 0).toBeLessThanOrEqual((clean.ppfd ?? 0) + 1e-9);
      }),
      { numRuns: 60 },
    );
  });
});
