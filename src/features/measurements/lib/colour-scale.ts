/**
 * The heat map's colour scale, our own: deep slate through spruce, leaf and gold to pale straw,
 * dark for little light and pale for much, so the order reads without the legend and in grey.
 */
export const SCALE_STOPS: readonly { at: number; rgb: readonly [number, number, number] }[] = [
  { at: 0, rgb: [34, 48, 74] },
  { at: 0.25, rgb: [44, 110, 116] },
  { at: 0.5, rgb: [111, 158, 79] },
  { at: 0.75, rgb: [217, 181, 72] },
  { at: 1, rgb: [248, 236, 192] },
];

const hex = (n: number) => Math.round(n).toString(16).padStart(2, '0');

/** Position of a value between lo and hi, 0…1 (0.5 when they are equal). */
export function scalePosition(value: number, lo: number, hi: number): number {
  if (!(hi > lo)) return 0.5;
  return Math.min(1, Math.max(0, (value - lo) / (hi - lo)));
}

/** The colour at position t (0…1) as #rrggbb, linear between the stops. */
export function colourAt(t: number): string {
  const upper = SCALE_STOPS.findIndex((s) => s.at >= t);
  const b = SCALE_STOPS[Math.max(upper, 0)]!;
  const a = SCALE_STOPS[Math.max(upper - 1, 0)]!;
  const f = b.at === a.at ? 0 : (t - a.at) / (b.at - a.at);
  const rgb = a.rgb.map((c, i) => c + (b.rgb[i]! - c) * f);
  return `#${rgb.map(hex).join('')}`;
}

const INK = '#1e2a2c';
const WHITE = '#ffffff';

/** WCAG 2.1 relative luminance of #rrggbb. */
export function relativeLuminance(hex: string): number {
  const lin = hex.slice(1).match(/../g)!.map((h) => parseInt(h, 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * lin[0]! + 0.7152 * lin[1]! + 0.0722 * lin[2]!;
}

/** WCAG 2.1 contrast ratio of two colours, 1…21. */
export function contrastRatio(a: string, b: string): number {
  const [hi, lo] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}

/** Ink or white, whichever stands out more on the colour at position t. */
export function textOn(t: number): string {
  const fill = colourAt(t);
  return contrastRatio(fill, INK) >= contrastRatio(fill, WHITE) ? INK : WHITE;
}

/** The other of ink and white: a thin halo round the figures, so their edges stand out even mid-scale. */
export function haloOn(t: number): string {
  return textOn(t) === INK ? WHITE : INK;
}
