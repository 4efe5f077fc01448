import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fixtureEfficacyFromCanopy, gridDocument, parsePpfdGridCsv, readPpfdGrid, summarisePpfdGrid } from '../../src/engine';
import { as } from '../../src/engine/units';
import type { Fraction, MicromolePerJoule, SquareMetres, Watts } from '../../src/engine/units';

const MATRIX = '400,450,500\n550,600,650\n700,750,800\n';
const POINTS = 'x,y,ppfd\n0,0,400\n0.5,0,450\n1,0,500\n0,0.5,550\n0.5,0.5,600\n1,0.5,650\n0,1,700\n0.5,1,750\n1,1,800\n';

const summary = (text: string, context = {}) => {
  const read = readPpfdGrid(text, context);
  if (!read.ok) throw new Error(read.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return read.value;
};

describe('PPFD grid summary', () => {
  // Worked example of issue 5: 400, 450 … 800 → mean 600, min/mean 0.6667, min/max 0.5, population CV 0.21517
  // (population SD = sqrt(Σ(v − 600)² / 9) = sqrt(150000 / 9) = 129.10; 129.10 / 600 = 0.21517)
  it('gives mean 600, min/mean 0.6667, min/max 0.5 and population CV 0.21517 for the 3 × 3 grid 400, 450 … 800 (issue 5 worked example)', () => {
    const s = summary(MATRIX);
    expect([s.rows, s.cols, s.count]).toEqual([3, 3, 9]);
    expect(s.mean).toBe(600);
    expect(s.min).toBe(400);
    expect(s.max).toBe(800);
    expect(s.minOverMean).toBeCloseTo(0.6667, 4);
    expect(s.minOverMax).toBe(0.5);
    expect(s.cv).toBeCloseTo(0.21517, 5);
  });

  it('gives the same figures for the same grid written as x, y, ppfd rows, in any row order', () => {
    const shuffled = ['x,y,ppfd', ...POINTS.trim().split('\n').slice(1).reverse()].join('\n');
    const expected = gridDocument(summary(MATRIX));
    expect(gridDocument(summary(POINTS))).toEqual(expected);
    expect(gridDocument(summary(shuffled))).toEqual(expected);
    expect(summary(shuffled).xM).toEqual([0, 0.5, 1]);
  });

  it('accepts units in the header, a byte-order mark, CRLF line ends and blank lines', () => {
    const text = '\ufeffx (m),y (m),PPFD (µmol m-2 s-1)\r\n' + POINTS.split('\n').slice(1).join('\r\n') + '\r\n\r\n';
    expect(gridDocument(summary(text))).toEqual(gridDocument(summary(MATRIX)));
  });

  it('adds canopy flux (mean × area) and efficacy at the canopy (flux / wall watts) only when given', () => {
    const withArea = summary(MATRIX, { areaM2: 1.44 as SquareMetres });
    expect(withArea.canopyFlux).toBeCloseTo(864, 9);
    expect(withArea.efficacyAtCanopy).toBeNull();
    expect(gridDocument(withArea)).not.toHaveProperty('efficacyAtCanopy');
    const both = summary(MATRIX, { areaM2: 1.44 as SquareMetres, wallWatts: 600 as Watts });
    expect(both.efficacyAtCanopy).toBeCloseTo(1.44, 9);
    expect(gridDocument(summary(MATRIX))).not.toHaveProperty('canopyFlux');
  });

  it('keeps the readings by row and column for a heat map', () => {
    expect(summary(MATRIX).cells).toEqual([
      [400, 450, 500],
      [550, 600, 650],
      [700, 750, 800],
    ]);
  });

  const grids = fc
    .tuple(fc.integer({ min: 1, max: 8 }), fc.integer({ min: 1, max: 8 }))
    .chain(([r, c]) => fc.array(fc.array(fc.double({ min: 1, max: 2500, noNaN: true }), { minLength: c, maxLength: c }), { minLength: r, maxLength: r }));

  it('has a CV, min/mean and min/max that do not change when every reading is scaled', () => {
    fc.assert(
      fc.property(grids, fc.double({ min: 0.01, max: 100, noNaN: true }), (values, k) => {
        const a = summarisePpfdGrid({ rows: values.length, cols: values[0]!.length, values: values as never, xM: null, yM: null });
        const scaled = values.map((r) => r.map((v) => v * k));
        const b = summarisePpfdGrid({ rows: values.length, cols: values[0]!.length, values: scaled as never, xM: null, yM: null });
        expect(b.cv).toBeCloseTo(a.cv, 9);
        expect(b.minOverMean).toBeCloseTo(a.minOverMean, 9);
        expect(b.mean / a.mean).toBeCloseTo(k, 9);
      }),
    );
  });

  it('reads back any matrix it is given as CSV, with min ≤ mean ≤ max and uniformity between 0 and 1', () => {
    fc.assert(
      fc.property(grids, (values) => {
        const parsed = parsePpfdGridCsv(values.map((r) => r.join(',')).join('\n'));
        expect(parsed.ok).toBe(true);
        if (!parsed.ok) return;
        expect(parsed.value.values).toEqual(values);
        const s = summarisePpfdGrid(parsed.value);
        expect(s.min).toBeLessThanOrEqual(s.mean * (1 + 1e-12));
        expect(s.mean).toBeLessThanOrEqual(s.max * (1 + 1e-12));
        expect(s.minOverMax).toBeGreaterThan(0);
        expect(s.minOverMean).toBeLessThanOrEqual(1 + 1e-12);
      }),
    );
  });
});

describe('fixtureEfficacyFromCanopy', () => {
  it('divides the efficacy at the canopy by the share of photons on the measured area, and refuses a share outside (0, 1]', () => {
    // 2.16 µmol/J measured with 80 % of the photons on the area: the fixture gives 2.7 µmol/J (η = η_canopy / share).
    expect(fixtureEfficacyFromCanopy(as<MicromolePerJoule>(2.16), as<Fraction>(0.8))).toBeCloseTo(2.7, 12);
    expect(fixtureEfficacyFromCanopy(as<MicromolePerJoule>(2.16), as<Fraction>(1))).toBe(2.16);
    for (const bad of [0, -0.5, 1.01, Number.NaN]) expect(() => fixtureEfficacyFromCanopy(as<MicromolePerJoule>(2), as<Fraction>(bad))).toThrow(RangeError);
  });
});
