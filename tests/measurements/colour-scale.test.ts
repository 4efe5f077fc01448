import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { colourAt, contrastRatio, haloOn, relativeLuminance, scalePosition, SCALE_STOPS, textOn } from '../../src/features/measurements/lib/colour-scale';

const luminance = relativeLuminance;
const contrast = contrastRatio;

describe('the heat map colour scale', () => {
  it('starts and ends on its first and last stops', () => {
    expect(colourAt(0)).toBe('#22304a');
    expect(colourAt(1)).toBe(`#${SCALE_STOPS[SCALE_STOPS.length - 1]!.rgb.map((c) => c.toString(16)).join('')}`);
  });

  it('grows paler as the reading grows, so the order reads in grey too (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (a, b) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        expect(luminance(colourAt(hi))).toBeGreaterThanOrEqual(luminance(colourAt(lo)) - 1e-3);
      }),
    );
  });

  // WCAG 2.1 asks 4.5:1 for small text (SC 1.4.3): a mid-scale fill cannot give that to ink or white alone,
  // so the figures get a halo of the other colour, and the fill itself keeps what ink or white can give.
  it('writes each value in ink or white, whichever stands out more, with a halo of the other', () => {
    for (let i = 0; i <= 1000; i++) {
      const t = i / 1000;
      expect(contrast(colourAt(t), textOn(t))).toBeGreaterThanOrEqual(3.8);
      expect(contrast(textOn(t), haloOn(t))).toBeGreaterThanOrEqual(4.5);
    }
  });

  it('places readings between the lowest and highest, and a flat grid in the middle', () => {
    expect(scalePosition(600, 400, 800)).toBe(0.5);
    expect(scalePosition(400, 400, 800)).toBe(0);
    expect(scalePosition(900, 400, 800)).toBe(1);
    expect(scalePosition(500, 500, 500)).toBe(0.5);
  });
});
