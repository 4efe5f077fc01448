import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

// The product's palette, read from the stylesheet the client ships.
const css = readFileSync('src/styles/index.css', 'utf8');
const colour = (name: string): string => {
  const found = new RegExp(`--color-${name}:\\s*(#[0-9a-f]{6});`, 'i').exec(css)?.[1];
  if (!found) throw new Error(`--color-${name} is not in src/styles/index.css`);
  return found;
};

/** Relative luminance of an sRGB colour, W3C WCAG 2.1 (2018), definition "relative luminance". */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => {
    const v = parseInt(hex.slice(i, i + 2), 16) / 255;
    return v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** Contrast ratio (L1 + 0.05) / (L2 + 0.05), W3C WCAG 2.1 (2018), definition "contrast ratio". */
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

const grounds = ['paper', 'panel', 'spruce-50'];

describe('the palette', () => {
  it('computes the contrast ratios WCAG 2.1 gives for black and white (21:1) and for equal colours (1:1)', () => {
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 10);
    expect(contrast('#777777', '#777777')).toBe(1);
    // #767676 on white is the lightest grey commonly quoted as passing 4.5:1 (common practice).
    expect(contrast('#767676', '#ffffff')).toBeGreaterThanOrEqual(4.5);
  });

  it('keeps every text colour at 4.5:1 or more on every ground (WCAG 2.1 SC 1.4.3, AA)', () => {
    const low = ['ink', 'ink-soft', 'spruce-600', 'spruce-700', 'danger-700', 'ok-700', 'gold-800'].flatMap((text) =>
      grounds.map((ground) => ({ text, ground, ratio: contrast(colour(text), colour(ground)) })).filter((p) => p.ratio < 4.5),
    );
    expect(low).toEqual([]);
  });

  it('keeps every technology colour at 3:1 or more on every ground, as marks and chart series must be (WCAG 2.1 SC 1.4.11)', () => {
    const low = ['hps', 'mh', 'cmh', 'led', 'fluorescent', 'other'].flatMap((tech) =>
      grounds.map((ground) => ({ tech, ground, ratio: contrast(colour(`tech-${tech}`), colour(ground)) })).filter((p) => p.ratio < 3),
    );
    expect(low).toEqual([]);
  });
});
