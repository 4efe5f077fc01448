import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  btuPerHourToWatts,
  displayArea,
  displayHeat,
  displayLength,
  feetToMetres,
  metresToFeet,
  squareFeetToSquareMetres,
  squareMetresToSquareFeet,
  wattsToBtuPerHour,
} from '../../src/engine/units-convert';

// NIST Special Publication 811 (Thompson & Taylor, Guide for the Use of the International System of
// Units (SI), 2008), Appendix B.8: foot → metre 3.048 E-01 (exact); square foot → square metre
// 9.290 304 E-02 (exact); watt → BTU_IT per hour 3.412 142.
describe('units-convert', () => {
  it('turns 1 ft into exactly 0.3048 m and 10 ft into 3.048 m (NIST SP 811, B.8)', () => {
    expect(feetToMetres(1)).toBe(0.3048);
    expect(feetToMetres(10)).toBeCloseTo(3.048, 12);
    expect(metresToFeet(0.3048)).toBeCloseTo(1, 12);
  });

  it('turns 1 ft² into 0.09290304 m², so a 4 ft × 4 ft tent is 1.48644864 m² (NIST SP 811, B.8)', () => {
    expect(squareFeetToSquareMetres(1)).toBe(0.09290304);
    expect(squareFeetToSquareMetres(16)).toBeCloseTo(1.48644864, 12);
    expect(squareMetresToSquareFeet(1)).toBeCloseTo(10.7639104, 6);
  });

  it('turns 1 W into 3.412142 BTU/h and 1000 W of lamp heat into 3412.142 BTU/h (NIST SP 811, B.8)', () => {
    expect(wattsToBtuPerHour(1)).toBe(3.412142);
    expect(wattsToBtuPerHour(1000)).toBeCloseTo(3412.142, 9);
    expect(btuPerHourToWatts(3412.142)).toBeCloseTo(1000, 9);
  });

  it('round-trips every conversion', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (x) => {
        expect(metresToFeet(feetToMetres(x))).toBeCloseTo(x, 6);
        expect(squareMetresToSquareFeet(squareFeetToSquareMetres(x))).toBeCloseTo(x, 6);
        expect(btuPerHourToWatts(wattsToBtuPerHour(x))).toBeCloseTo(x, 6);
      }),
    );
  });

  it('shows SI figures unchanged in the metric system and converts them in the imperial one', () => {
    expect(displayLength(3, 'si')).toEqual({ value: 3, unit: 'm' });
    expect(displayArea(24, 'si')).toEqual({ value: 24, unit: 'm²' });
    expect(displayHeat(640, 'si')).toEqual({ value: 640, unit: 'W' });
    expect(displayLength(3.048, 'imperial').unit).toBe('ft');
    expect(displayLength(3.048, 'imperial').value).toBeCloseTo(10, 12);
    expect(displayArea(1.48644864, 'imperial').value).toBeCloseTo(16, 12);
    expect(displayHeat(1000, 'imperial')).toEqual({ value: 3412.142, unit: 'BTU/h' });
  });
});
