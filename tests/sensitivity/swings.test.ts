import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkSwingSettings, ledgerPresentValues, numericInputs, runSwings } from '../../src/engine';
import { withPrice } from '../../src/engine/sensitivity/ledger-values';
import { relDiff, roomArb, sixOptions } from './fixtures';

describe('numericInputs', () => {
  it('lists every numeric field that enters the costs, and no spectrum figure', () => {
    const paths = numericInputs(sixOptions()).map((i) => i.path);
    expect(paths).toContain('electricity.pricePerKwh');
    expect(paths).toContain('schedule[1].daysPerYear');
    expect(paths).toContain('options[4].ppf');
    expect(paths).toContain('options[0].lamp.replaceEveryHours');
    expect(paths).toContain('options[3].outputAtHorizonPct');
    expect(paths.some((p) => p.includes('spectrum'))).toBe(false);
    expect(new Set(paths).size).toBe(paths.length);
  });
});

describe('runSwings', () => {
  it('keeps every swung scenario valid and ranks the rows largest first (property)', () => {
    fc.assert(
      fc.property(roomArb, fc.double({ min: 1, max: 95, noNaN: true }), (s, pct) => {
        const r = runSwings(s, { pct });
        expect(r.invalid).toEqual([]);
        expect(r.rows.length).toBe(numericInputs(s).length);
        for (let k = 1; k < r.rows.length; k++) expect(r.rows[k]!.size).toBeLessThanOrEqual(r.rows[k - 1]!.size);
      }),
      { numRuns: 25 },
    );
  });

  it('clamps at the valid range: utilization 1 and a full-year schedule cannot go up', () => {
    const s = sixOptions({ utilization: 1, schedule: [{ label: 'all year', hoursPerDay: 12, daysPerYear: 365 }] });
    const rows = new Map(runSwings(s, { pct: 20 }).rows.map((r) => [r.path, r]));
    expect(rows.get('utilization')).toMatchObject({ low: 0.8, high: 1, clamped: true });
    expect(rows.get('schedule[0].daysPerYear')).toMatchObject({ low: 292, high: 366, clamped: true });
    expect(rows.get('horizonYears')).toMatchObject({ low: 8, high: 12, clamped: false });
  });

  it('moves each present value by β × 0.4 × price for a ±20 % price swing, β the ledger’s slope in price', () => {
    const s = sixOptions();
    const r = runSwings(s, { pct: 20 });
    const row = r.rows.find((x) => x.path === 'electricity.pricePerKwh')!;
    const at0 = ledgerPresentValues(withPrice(s, '0'));
    const at1 = ledgerPresentValues(withPrice(s, '1'));
    s.options.forEach((_, i) => {
      const beta = at1[i]!.minus(at0[i]!).toNumber();
      expect(relDiff(row.presentValueHigh[i]! - row.presentValueLow[i]!, beta * 0.4 * 0.24)).toBeLessThan(1e-9);
    });
  });

  it('ranks by the gap between two options when asked, measured as PV(a) − PV(b)', () => {
    const r = runSwings(sixOptions(), { pct: 20, measure: { kind: 'gap', a: 'old-sodium', b: 'led-wide' } });
    for (const row of r.rows) expect(row.measureLow).toBeCloseTo(row.presentValueLow[0]! - row.presentValueLow[3]!, 6);
    expect(r.baseMeasure).toBeCloseTo(r.basePresentValue[0]! - r.basePresentValue[3]!, 6);
    expect(r.rows[0]!.size).toBeGreaterThan(0);
  });

  it('refuses a measure that names an unknown option', () => {
    expect(checkSwingSettings(sixOptions(), { pct: 20, measure: { kind: 'gap', a: 'old-sodium', b: 'nope' } }).map((p) => p.path)).toEqual(['measure.b']);
  });
});
