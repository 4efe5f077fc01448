/** Planck constant, J·s (CODATA 2018, exact since the 2019 SI). */
export const PLANCK_H = 6.62607015e-34;
/** Speed of light in vacuum, m/s (exact). */
export const LIGHT_C = 299792458;
/** Avogadro constant, mol⁻¹ (CODATA 2018, exact since the 2019 SI). */
export const AVOGADRO_NA = 6.02214076e23;
/** Second radiation constant used for Planckian radiators, m·K (ITS-90 value, as CIE 15 uses). */
export const PLANCK_C2 = 1.4388e-2;

/** Energy of one mole of photons times their wavelength, J·m/mol: E(λ) = h c N_A / λ. */
const MOLAR_HC = PLANCK_H * LIGHT_C * AVOGADRO_NA;

/**
 * Photon flux carried by radiant power at one wavelength: µmol/s = W × λ / (h c N_A), with λ in
 * metres; the same factor turns W m⁻² nm⁻¹ into µmol m⁻² s⁻¹ nm⁻¹.
 * @param watts radiant power, W (or W m⁻² nm⁻¹)
 * @param wavelengthNm nm
 * @returns µmol/s (or µmol m⁻² s⁻¹ nm⁻¹)
 */
export function photonsFromWatts(watts: number, wavelengthNm: number): number {
  return (watts * wavelengthNm * 1e-9 * 1e6) / MOLAR_HC;
}

/**
 * Radiant power carried by a photon flux at one wavelength, the inverse of photonsFromWatts.
 * @param micromolesPerSecond µmol/s (or µmol m⁻² s⁻¹ nm⁻¹)
 * @param wavelengthNm nm
 * @returns W (or W m⁻² nm⁻¹)
 */
export function wattsFromPhotons(micromolesPerSecond: number, wavelengthNm: number): number {
  return (micromolesPerSecond * MOLAR_HC) / (wavelengthNm * 1e-9 * 1e6);
}
