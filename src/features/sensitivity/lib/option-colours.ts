import type { Scenario, Technology } from '../../../contracts/scenario';
import { TECHNOLOGY_COLOURS } from '../../../components/technology';

/** How an option is drawn: its technology's colour, lightened or darkened when it shares the technology with an earlier option. */
export interface OptionStyle {
  id: string;
  technology: Technology;
  /** CSS colour for SVG and HTML (a theme variable, or color-mix of one) */
  css: string;
  /** how far the colour is mixed toward white (+) or black (−), 0 for the first of a technology */
  mix: number;
}

/** Mixes for the 1st, 2nd, 3rd … option of one technology. */
const MIXES = [0, 0.45, -0.35, 0.7, -0.55];

/** A style per option, in scenario order. */
export function optionStyles(s: Scenario): OptionStyle[] {
  const seen = new Map<Technology, number>();
  return s.options.map((o) => {
    const k = seen.get(o.technology) ?? 0;
    seen.set(o.technology, k + 1);
    const mix = MIXES[k % MIXES.length]!;
    const base = TECHNOLOGY_COLOURS[o.technology];
    const css = mix === 0 ? base : `color-mix(in srgb, ${base} ${Math.round((1 - Math.abs(mix)) * 100)}%, ${mix > 0 ? 'white' : 'black'})`;
    return { id: o.id, technology: o.technology, css, mix };
  });
}

/** [r, g, b] of a #rrggbb colour. */
function rgbOf(hex: string): [number, number, number] {
  const m = /^#?([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex.trim());
  return m ? [parseInt(m[1]!, 16), parseInt(m[2]!, 16), parseInt(m[3]!, 16)] : [138, 132, 120];
}

/**
 * The style as [r, g, b] for a canvas, reading the technology colour from the page's theme variables
 * so the canvas and the SVG legend always agree.
 */
export function styleRgb(style: OptionStyle, root: Element = document.documentElement): [number, number, number] {
  const variable = /var\((--[a-z-]+)\)/.exec(TECHNOLOGY_COLOURS[style.technology])?.[1] ?? '';
  const [r, g, b] = rgbOf(getComputedStyle(root).getPropertyValue(variable));
  const t = Math.abs(style.mix);
  const to = style.mix > 0 ? 255 : 0;
  const mixed = (c: number) => Math.round(c * (1 - t) + to * t);
  return [mixed(r), mixed(g), mixed(b)];
}
