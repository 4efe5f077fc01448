import { FAR_RED_WINDOW_NM, RED_WINDOW_NM, SPECTRUM_BANDS } from '../../../engine/measurements/spectrum-summary';

/** The photon bands, their names and the tint that shades each one on the chart. */
export const BANDS = [
  { key: 'blue', name: 'Blue', nm: SPECTRUM_BANDS.blue, tint: '#6d8fd6' },
  { key: 'green', name: 'Green', nm: SPECTRUM_BANDS.green, tint: '#6fae72' },
  { key: 'red', name: 'Red', nm: SPECTRUM_BANDS.red, tint: '#d8674f' },
  { key: 'farRed', name: 'Far-red', nm: SPECTRUM_BANDS.farRed, tint: '#8e3b52' },
] as const;

export { FAR_RED_WINDOW_NM, RED_WINDOW_NM };
