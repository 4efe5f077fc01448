import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cctFromUv, planckianUv, readSpectrum, uvFromXy } from '../../src/engine';
import { planck, spectrumCsv, wavelengths } from './spectra';

const planckian = (kelvin: number, from = 360, to = 830, step = 1) => {
  const read = readSpectrum(spectrumCsv(wavelengths(from, to, step), (nm) => planck(nm, kelvin)), 'w');
  if (!read.ok) throw new Error(read.problems.map((p) => p.message).join('\n'));
  return read.value;
};

describe('CIE 1931 chromaticity', () => {
  it('gives x 0.44754, y 0.40743 for a Planckian radiator at 2856 K, 360–830 nm at 1 nm (value in /work/shared/data/README.md)', () => {
    const s = planckian(2856);
    expect(s.cie1931?.x).toBeCloseTo(0.44754, 5);
    expect(s.cie1931?.y).toBeCloseTo(0.40743, 5);
  });

  it('lands within 5e-5 of CIE illuminant A, x 0.44757, y 0.40745 (CIE 15:2018, Colorimetry, 4th ed.; A was defined with an older c2)', () => {
    const s = planckian(2856);
    expect(Math.abs((s.cie1931?.x ?? 0) - 0.44757)).toBeLessThan(5e-5);
    expect(Math.abs((s.cie1931?.y ?? 0) - 0.40745)).toBeLessThan(5e-5);
  });

  it('is null when the data do not cover 380–780 nm, and so is the CCT', () => {
    const s = planckian(3000, 390, 830);
    expect(s.cie1931).toBeNull();
    expect(s.cctK).toBeNull();
  });

  it('needs no 1 nm data: a 5 nm Planckian at 2856 K still lands within 2e-4 of illuminant A (CIE 15:2018)', () => {
    const s = planckian(2856, 380, 780, 5);
    expect(Math.abs((s.cie1931?.x ?? 0) - 0.44757)).toBeLessThan(2e-4);
    expect(Math.abs((s.cie1931?.y ?? 0) - 0.40745)).toBeLessThan(2e-4);
  });
});

describe('correlated colour temperature (Ohno 2014, LEUKOS 10(1): 47–55)', () => {
  it('gives 2856 K back for the 2856 K Planckian radiator (the temperature of CIE illuminant A, CIE 15:2018)', () => {
    expect(planckian(2856).cctK).toBeCloseTo(2856, 0);
  });

  it.each([2000, 3000, 4000, 6500])('gives %i K back for a Planckian radiator at that temperature, within 1 K (definition of CCT, CIE 15:2018)', (kelvin) => {
    const s = planckian(kelvin);
    expect(Math.abs((s.cctK ?? 0) - kelvin)).toBeLessThan(1);
    expect(Math.abs(s.duv ?? 1)).toBeLessThan(1e-6);
  });

  it('puts CIE 1960 uv 0.30505, 0.35907 at about 2000 K (Robertson 1968 check of a well-known colour-science library test suite, as quoted in issue 5)', () => {
    expect(cctFromUv(0.30505, 0.35907)?.cctK).toBeCloseTo(2000, -1);
    expect(Math.abs((cctFromUv(0.30505, 0.35907)?.cctK ?? 0) - 2000)).toBeLessThan(2);
  });

  it('finds the temperature and Duv of points set off the locus along its normal (the definition Ohno 2014 computes)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1500, max: 15000, noNaN: true }), fc.double({ min: -0.03, max: 0.03, noNaN: true }), (kelvin, duv) => {
        const [u0, v0] = planckianUv(kelvin);
        const [u1, v1] = planckianUv(kelvin * 1.0001);
        const [u2, v2] = planckianUv(kelvin / 1.0001);
        const len = Math.hypot(u1 - u2, v1 - v2);
        // the normal pointing to larger v: (−dv, du) with du < 0 along rising temperature
        const nu = -(v1 - v2) / len;
        const nv = (u1 - u2) / len;
        const sign = nv > 0 ? 1 : -1;
        const found = cctFromUv(u0 + sign * nu * duv, v0 + sign * nv * duv);
        expect(found).not.toBeNull();
        expect(Math.abs((found?.cctK ?? 0) - kelvin) / kelvin).toBeLessThan(2e-4);
        expect(found?.duv ?? 1).toBeCloseTo(duv, 5);
      }),
      { numRuns: 60 },
    );
  });

  it('gives no CCT farther than |Duv| 0.05 from the locus (CIE 15:2018) or outside 1000–20000 K', () => {
    const [u, v] = planckianUv(3000);
    expect(cctFromUv(u, v + 0.06)).toBeNull();
    expect(cctFromUv(...uvFromXy(0.3, 0.6))).toBeNull();
    expect(cctFromUv(...planckianUv(900))).toBeNull();
  });
});
