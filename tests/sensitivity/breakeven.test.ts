import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { breakevenEfficacy, breakevenPrice, computeScenario, ledgerPresentValues } from '../../src/engine';
import { annuityRoom, lampless, relDiff, roomArb, sixOptions, withPriceAndFactor } from './fixtures';


describe('breakevenPrice', () => {
  it('matches the annuity break-even worked with the financial package (port of numpy-financial) pv', () => {
    // PV = n × capex + E × price × AF in annuityRoom (NIST Handbook 135's uniform present value factor, via financial's pv).
    const { scenario: s, af, count, kwh } = annuityRoom();
    const expected = (count(2.8) * 900 - count(1.5) * 250) / ((kwh(1.5) - kwh(2.8)) * af);
    const r = breakevenPrice(s, { a: 'cheap', b: 'frugal' });
    expect(r.pricePerKwh).not.toBeNull();
    expect(Math.abs(r.pricePerKwh! - expected)).toBeLessThan(1e-9);
    expect(r.verified).toBe(true);
  });

  it('gives equal present values through the decimal ledger at the break-even price, to 1e-6 relative (property)', () => {
    let found = 0;
    fc.assert(
      fc.property(roomArb, fc.integer({ min: 0, max: 5 }), fc.integer({ min: 1, max: 5 }), (s, i, step) => {
        const j = (i + step) % 6;
        const a = s.options[i]!.id;
        const b = s.options[j]!.id;
        const r = breakevenPrice(s, { a, b });
        expect(r.verified).toBe(true);
        if (r.pricePerKwh === null) return;
        found += 1;
        const at = computeScenario(withPriceAndFactor(s, r.pricePerKwh, 0, 1));
        const pv = (id: string) => Number(at.options.find((o) => o.id === id)!.totalPresentValue);
        expect(relDiff(pv(a), pv(b))).toBeLessThan(1e-6);
      }),
      { numRuns: 150 },
    );
    expect(found).toBeGreaterThan(20);
  });

  it('agrees with bisection on the fast path to 1e-9 per kWh', () => {
    const r = breakevenPrice(sixOptions(), { a: 'old-sodium', b: 'led-wide' });
    expect(r.pricePerKwh).not.toBeNull();
    expect(Math.abs(r.bracketed! - r.pricePerKwh!)).toBeLessThan(1e-9);
  });

  it('is null when the options cost the same at every price, never meet, or meet only above 100 per kWh', () => {
    const twin = (id: string, price: string) => lampless(id, 500, 2.4, price);
    const base = { baseline: 'x', options: [twin('x', '700'), twin('y', '700')] };
    expect(breakevenPrice(sixOptions(base), { a: 'x', b: 'y' })).toMatchObject({ pricePerKwh: null, reason: 'equal-at-every-price' });
    const dearer = { baseline: 'x', options: [twin('x', '700'), twin('y', '900')] };
    expect(breakevenPrice(sixOptions(dearer), { a: 'x', b: 'y' })).toMatchObject({ pricePerKwh: null, reason: 'never-equal', verified: true });
    const far = { baseline: 'x', options: [lampless('x', 500, 2.4, '700'), lampless('y', 500, 2.41, '90000')] };
    expect(breakevenPrice(sixOptions(far), { a: 'x', b: 'y' })).toMatchObject({ pricePerKwh: null, reason: 'outside-range', verified: true });
  });
});

describe('breakevenEfficacy', () => {
  it('finds the multiplier where the decimal ledger gives equal present values when counts are exact', () => {
    const s = sixOptions();
    const iv = s.options.findIndex((o) => o.id === 'ceramic');
    const r = breakevenEfficacy(s, { vary: 'ceramic', against: 'led-wide', lo: 0.1, hi: 3.5 });
    expect(r.kind).toBe('crossing');
    const pvs = ledgerPresentValues(s, { index: iv, factor: r.factor! });
    expect(relDiff(pvs[iv]!.toNumber(), pvs[3]!.toNumber())).toBeLessThan(1e-9);
    // With exact counts every cost scales with the count, which falls as 1 / multiplier (engine rules v1).
    const asEntered = ledgerPresentValues(s);
    expect(relDiff(r.factor!, asEntered[iv]!.toNumber() / asEntered[3]!.toNumber())).toBeLessThan(1e-9);
  });

  it('stops at the step where whole fixtures make the option no dearer (property)', () => {
    let found = 0;
    fc.assert(
      fc.property(roomArb, fc.integer({ min: 0, max: 5 }), fc.integer({ min: 1, max: 5 }), (room, i, step) => {
        const s = { ...room, fixtureCount: 'whole' as const };
        const j = (i + step) % 6;
        const r = breakevenEfficacy(s, { vary: s.options[i]!.id, against: s.options[j]!.id, lo: 0.1, hi: 10 });
        if (r.factor === null) return;
        found += 1;
        const gap = (f: number) => {
          const pv = ledgerPresentValues(s, { index: i, factor: f });
          return pv[i]!.minus(pv[j]!).toNumber();
        };
        const scale = Math.abs(ledgerPresentValues(s)[j]!.toNumber());
        expect(gap(r.factor)).toBeLessThanOrEqual(1e-9 * scale);
        expect(gap(r.factor * (1 - 1e-9))).toBeGreaterThan(-1e-9 * scale);
      }),
      { numRuns: 100 },
    );
    expect(found).toBeGreaterThan(20);
  });

  it('is null when the option is no dearer even at the lowest multiplier searched', () => {
    const r = breakevenEfficacy(sixOptions(), { vary: 'led-wide', against: 'tubes', lo: 0.9, hi: 2 });
    expect(r.factor).toBeNull();
  });

  it('caps the search at the physical efficacy limit of 5.85 µmol/J', () => {
    const r = breakevenEfficacy(sixOptions(), { vary: 'led-wide', against: 'tubes', lo: 0.1, hi: 10 });
    expect(r.searched[1]).toBeCloseTo(5.85 / 2.7, 12);
  });
});
