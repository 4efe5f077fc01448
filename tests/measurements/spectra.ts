import { PLANCK_C2 } from '../../src/engine';

/** Wavelength samples from `from` to `to` nm every `step` nm. */
export function wavelengths(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  for (let k = 0; from + k * step <= to + 1e-9; k++) out.push(+(from + k * step).toFixed(6));
  return out;
}

/** Planck's law, spectral radiant exitance per nm up to a constant factor, with c2 = 1.4388e-2 m·K. */
export function planck(nm: number, kelvin: number): number {
  const m = nm * 1e-9;
  return 1e-14 / (m ** 5 * Math.expm1(PLANCK_C2 / (m * kelvin)));
}

/** A Gaussian emission line of height 1 at `peak` nm with full width at half maximum `fwhm` nm. */
export function line(nm: number, peak: number, fwhm: number): number {
  return Math.exp((-4 * Math.LN2 * (nm - peak) ** 2) / fwhm ** 2);
}

/** Spectrum CSV text with a header from wavelengths and a value function. */
export function spectrumCsv(nm: number[], value: (at: number) => number, header = 'wavelength_nm,value'): string {
  return `${header}\n${nm.map((at) => `${at},${value(at)}`).join('\n')}\n`;
}
