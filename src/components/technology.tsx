import type { Technology } from '../contracts/scenario';

/** Plain names of the lamp technologies (trade abbreviations kept where the trade uses them). */
export const TECHNOLOGY_NAMES: Record<Technology, string> = {
  hps: 'HPS (high-pressure sodium)',
  mh: 'MH (metal halide)',
  cmh: 'CMH (ceramic metal halide)',
  led: 'LED',
  fluorescent: 'Fluorescent',
  other: 'Other',
};

/** Short names for dense tables. */
export const TECHNOLOGY_SHORT: Record<Technology, string> = {
  hps: 'HPS',
  mh: 'MH',
  cmh: 'CMH',
  led: 'LED',
  fluorescent: 'Fluor.',
  other: 'Other',
};

/** Colours of our own per technology, as CSS variables from the theme; used for marks and chart series. */
export const TECHNOLOGY_COLOURS: Record<Technology, string> = {
  hps: 'var(--color-tech-hps)',
  mh: 'var(--color-tech-mh)',
  cmh: 'var(--color-tech-cmh)',
  led: 'var(--color-tech-led)',
  fluorescent: 'var(--color-tech-fluorescent)',
  other: 'var(--color-tech-other)',
};

/** Technologies with a discharge lamp (high-intensity discharge: ignition pulses, mercury, UV when broken). */
export const HID: ReadonlySet<Technology> = new Set(['hps', 'mh', 'cmh']);

/** A small square in the technology's colour followed by its short name; the text carries the meaning. */
export function TechnologyTag({ technology }: { technology: Technology }) {
  return (
    <span className="inline-flex items-center gap-1 text-sm whitespace-nowrap" title={TECHNOLOGY_NAMES[technology]}>
      <span aria-hidden="true" className="inline-block size-2.5 rounded-sm" style={{ background: TECHNOLOGY_COLOURS[technology] }} />
      {TECHNOLOGY_SHORT[technology]}
    </span>
  );
}
