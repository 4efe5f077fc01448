import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseSpectrumCsv, photonsFromWatts, readSpectrum, summariseSpectrum } from '../../src/engine';
import type { SpectrumSummary, SpectrumUnit } from '../../src/engine';
import { line, planck, spectrumCsv, wavelengths } from './spectra';

const read = (text: string, unit: SpectrumUnit = 'w'): SpectrumSummary => {
  const r = readSpectrum(text, unit);
  if (!r.ok) throw new Error(r.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return r.value;
};
const sumOfShares = (s: SpectrumSummary) => s.sharesPct.blue + s.sharesPct.green + s.sharesPct.red;

describe('spectrum PPFD and band shares', () => {
  it('integrates a flat photon spectrum of 1 µmol m⁻² s⁻¹ nm⁻¹ over 400–700 nm to a PPFD of 300, a third in each band', () => {
    const s = read(spectrumCsv(wavelengths(380, 800, 2), () => 1), 'umol');
    expect(s.ppfd).toBeCloseTo(300, 9);
    expect(s.sharesPct.blue).toBeCloseTo(100 / 3, 9);
    expect(s.sharesPct.green).toBeCloseTo(100 / 3, 9);
    expect(s.sharesPct.red).toBeCloseTo(100 / 3, 9);
    expect(s.sharesPct.farRed).toBeCloseTo(100 / 3, 9);
  });

  it('splits a band edge that falls between samples by linear interpolation, keeping the bands whole', () => {
    const s = read(spectrumCsv(wavelengths(396, 704, 7), () => 1), 'umol');
    expect(s.ppfd).toBeCloseTo(300, 9);
    expect(s.sharesPct.blue).toBeCloseTo(100 / 3, 9);
  });

  it('converts W m⁻² nm⁻¹ to photons with λ / (h c N_A): 1 W m⁻² nm⁻¹ flat over 400–700 nm is 300 W m⁻² = 1379.29 µmol m⁻² s⁻¹ (CODATA 2018; mean λ 550 nm)', () => {
    const s = read(spectrumCsv(wavelengths(400, 700, 1), () => 1), 'w');
    // ∫ λ dλ over 400–700 nm is 300 × 550 nm², exact for the trapezoid rule on a linear integrand
    expect(s.ppfd).toBeCloseTo(300 * photonsFromWatts(1, 550), 6);
    expect(s.ppfd).toBeCloseTo(1379.2923, 3);
  });

  it('gives the same figures for a spectrum in W m⁻² nm⁻¹ and the same one in µmol m⁻² s⁻¹ nm⁻¹', () => {
    const nm = wavelengths(360, 830, 1);
    const w = read(spectrumCsv(nm, (at) => planck(at, 3500)), 'w');
    const umol = read(spectrumCsv(nm, (at) => photonsFromWatts(planck(at, 3500), at)), 'umol');
    expect(umol.ppfd! / w.ppfd!).toBeCloseTo(1, 9);
    expect(umol.sharesPct.blue).toBeCloseTo(w.sharesPct.blue, 9);
    expect(umol.cie1931?.x).toBeCloseTo(w.cie1931?.x ?? 0, 9);
    expect(umol.cctK).toBeCloseTo(w.cctK ?? 0, 3);
  });

  it('gives no PPFD for relative input but the same shares, colour and ratios', () => {
    const text = spectrumCsv(wavelengths(360, 830, 1), (at) => planck(at, 3500));
    const w = read(text, 'w');
    const rel = read(text, 'relative');
    expect(rel.ppfd).toBeNull();
    expect(rel.sharesPct).toEqual(w.sharesPct);
    expect(rel.cctK).toBe(w.cctK);
    expect(rel.ypfdRatio).toBe(w.ypfdRatio);
  });

  it('gives 0 far-red and no red:far-red ratio when the data stop at 700 nm', () => {
    const s = read(spectrumCsv(wavelengths(400, 700, 5), () => 1));
    expect(s.sharesPct.farRed).toBe(0);
    expect(s.redFarRedRatio).toBeNull();
  });

  it('has blue, green and red shares that add to 100 % for any spectrum with steps up to 10 nm', () => {
    const spectra = fc.record({
      start: fc.double({ min: 300, max: 400, noNaN: true }),
      // just under 10 nm: a step of exactly 10 can come back as 10.000000000000002 after adding up wavelengths
      steps: fc.array(fc.double({ min: 0.05, max: 9.99, noNaN: true }), { minLength: 40, maxLength: 400 }),
      seed: fc.array(fc.double({ min: 0, max: 5, noNaN: true }), { minLength: 400, maxLength: 400 }),
    });
    fc.assert(
      fc.property(spectra, ({ start, steps, seed }) => {
        const nm = [start];
        for (const step of steps) nm.push(nm[nm.length - 1]! + step);
        while (nm[nm.length - 1]! < 705) nm.push(nm[nm.length - 1]! + 9.5);
        const values = nm.map((_, i) => seed[i % seed.length]! + 0.01);
        const parsed = parseSpectrumCsv(spectrumCsv(nm, (at) => values[nm.indexOf(at)] ?? 0), 'umol');
        expect(parsed.ok).toBe(true);
        if (!parsed.ok) return;
        expect(sumOfShares(summariseSpectrum(parsed.value))).toBeCloseTo(100, 10);
      }),
      { numRuns: 50 },
    );
  });

  it('scales PPFD with the spectrum and leaves shares, chromaticity, CCT and ratios unchanged', () => {
    const nm = wavelengths(360, 830, 2);
    fc.assert(
      fc.property(fc.double({ min: 1800, max: 9000, noNaN: true }), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (kelvin, k) => {
        const a = read(spectrumCsv(nm, (at) => planck(at, kelvin) + line(at, 450, 20)));
        const b = read(spectrumCsv(nm, (at) => k * (planck(at, kelvin) + line(at, 450, 20))));
        expect(b.ppfd! / a.ppfd!).toBeCloseTo(k, 6);
        expect(b.sharesPct.blue).toBeCloseTo(a.sharesPct.blue, 6);
        expect(b.sharesPct.farRed).toBeCloseTo(a.sharesPct.farRed, 6);
        expect(b.cie1931?.x).toBeCloseTo(a.cie1931?.x ?? 0, 9);
        expect(b.cie1931?.y).toBeCloseTo(a.cie1931?.y ?? 0, 9);
        if (a.cctK === null) expect(b.cctK).toBeNull();
        else expect(b.cctK! / a.cctK).toBeCloseTo(1, 6);
        expect(b.ypfdRatio).toBeCloseTo(a.ypfdRatio, 9);
      }),
      { numRuns: 25 },
    );
  });
});

describe('spectrum yield photon flux and red:far-red', () => {
  it.each([
    [450, 0.7],
    [625, 1.0],
    [550, 0.82],
  ])('weights a narrow line at %i nm by McCree’s field-mean yield there, %f (McCree 1972, Agric. Meteorol. 9: 191–216, Table IV)', (peak, rqy) => {
    const s = read(spectrumCsv(wavelengths(380, 800, 0.5), (at) => line(at, peak, 1)), 'umol');
    expect(s.ypfdRatio).toBeCloseTo(rqy, 2);
  });

  it('gives a red:far-red ratio of 1 for a flat photon spectrum, the two windows being 10 nm wide (Smith 1982, Annu. Rev. Plant Physiol. 33: 481–518)', () => {
    expect(read(spectrumCsv(wavelengths(380, 800, 5), () => 1), 'umol').redFarRedRatio).toBeCloseTo(1, 12);
  });

  it('reads more red than far-red from a red LED-like line and the reverse from a far-red one', () => {
    const nm = wavelengths(380, 800, 1);
    const redLed = read(spectrumCsv(nm, (at) => line(at, 660, 20) + 0.01), 'umol');
    const farRedLed = read(spectrumCsv(nm, (at) => line(at, 730, 25) + 0.01), 'umol');
    expect(redLed.redFarRedRatio).toBeGreaterThan(10);
    expect(farRedLed.redFarRedRatio).toBeLessThan(0.1);
  });
});

// Rough sanity bounds, common practice (figures of the trade quoted in issue 5, not a published table);
// the spectra are synthesised, so these check plausibility, not any real lamp.
describe('spectrum sanity bounds on synthesised lamp-like spectra (common practice)', () => {
  const nm = wavelengths(360, 830, 1);
  // Line positions are the lamps' usual emitters (sodium 589 nm, mercury 405/436/546/578 nm, indium
  // 451 nm, thallium 535 nm), recalled from memory; widths and strengths are shaped by hand to look
  // like each kind, and the bounds are the trade's rough figures quoted in issue 5.
  const hg = (at: number) => 0.5 * line(at, 405, 3) + 0.9 * line(at, 436, 3) + 1.0 * line(at, 546, 3) + 0.6 * line(at, 578, 4);
  const sodium = read(spectrumCsv(nm, (at) => line(at, 589, 40) + 0.6 * line(at, 569, 12) + 0.5 * line(at, 616, 15) + 0.1 * line(at, 498, 6) + 0.1 * line(at, 467, 6) + 0.06 * line(at, 450, 30) + 0.25 * line(at, 819, 10)));
  const metalHalide = read(spectrumCsv(nm, (at) => line(at, 575, 200) + 0.8 * hg(at) + 4 * line(at, 451, 6) + 0.5 * line(at, 535, 4) + 1.5 * line(at, 589, 10) + 0.8 * line(at, 660, 20) + 0.1 * line(at, 750, 60)));
  const ceramic = read(spectrumCsv(nm, (at) => line(at, 605, 240) + 0.3 * hg(at) + 0.15 * line(at, 451, 20) + 0.4 * line(at, 589, 14) + 0.3 * line(at, 670, 12) + 0.1 * line(at, 750, 60)));

  it('finds about 3–5 % blue and a CCT near 2000 K in a sodium-like spectrum', () => {
    expect(sodium.sharesPct.blue).toBeGreaterThan(2.5);
    expect(sodium.sharesPct.blue).toBeLessThan(6);
    expect(sodium.cctK!).toBeGreaterThan(1800);
    expect(sodium.cctK!).toBeLessThan(2300);
  });

  it('finds roughly a fifth to a quarter blue and a CCT near 4000 K in a metal-halide-like spectrum', () => {
    expect(metalHalide.sharesPct.blue).toBeGreaterThan(18);
    expect(metalHalide.sharesPct.blue).toBeLessThan(27);
    expect(metalHalide.cctK!).toBeGreaterThan(3700);
    expect(metalHalide.cctK!).toBeLessThan(4700);
  });

  it('finds near 15 % blue and a CCT of 3000–3500 K in a ceramic-metal-halide-like spectrum', () => {
    expect(ceramic.sharesPct.blue).toBeGreaterThan(11);
    expect(ceramic.sharesPct.blue).toBeLessThan(19);
    expect(ceramic.cctK!).toBeGreaterThan(3000);
    expect(ceramic.cctK!).toBeLessThan(3600);
  });

  it('ranks the three discharge kinds by blue as the trade does: metal halide, then ceramic metal halide, then sodium', () => {
    expect(metalHalide.sharesPct.blue).toBeGreaterThan(ceramic.sharesPct.blue);
    expect(ceramic.sharesPct.blue).toBeGreaterThan(sodium.sharesPct.blue);
    for (const s of [sodium, metalHalide, ceramic]) expect(sumOfShares(s)).toBeCloseTo(100, 9);
  });

  it('finds more blue as a Planckian radiator gets hotter: 2000 K < 3000 K < 4000 K < 6500 K', () => {
    const blue = [2000, 3000, 4000, 6500].map((k) => read(spectrumCsv(nm, (at) => planck(at, k))).sharesPct.blue);
    expect(blue).toEqual([...blue].sort((a, b) => a - b));
    expect(blue[0]!).toBeLessThan(5);
  });

  it('puts a white-LED-like spectrum (450 nm pump and a broad phosphor) between 2500 K and 6500 K with a yield ratio near 0.9', () => {
    const led = read(spectrumCsv(nm, (at) => 0.5 * line(at, 450, 20) + line(at, 600, 120)));
    expect(led.cctK!).toBeGreaterThan(2500);
    expect(led.cctK!).toBeLessThan(6500);
    expect(led.ypfdRatio).toBeGreaterThan(0.8);
    expect(led.ypfdRatio).toBeLessThan(1);
  });
});
