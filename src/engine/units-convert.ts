/**
 * Conversions between the SI units the engine works in and the imperial units some growers read.
 * Factors from NIST Special Publication 811 (Thompson & Taylor, Guide for the Use of the
 * International System of Units, 2008), Appendix B: the foot is exactly 0.3048 m, and
 * 1 W = 3.412142 BTU_IT/h.
 */

/** Metres in one international foot (exact). */
export const METRES_PER_FOOT = 0.3048;
/** Square metres in one square foot (exact: 0.3048²). */
export const SQUARE_METRES_PER_SQUARE_FOOT = 0.09290304;
/** BTU (International Table) per hour in one watt. */
export const BTU_PER_HOUR_PER_WATT = 3.412142;

/** Length: feet → metres. @param feet ft @returns m */
export function feetToMetres(feet: number): number {
  return feet * METRES_PER_FOOT;
}

/** Length: metres → feet. @param metres m @returns ft */
export function metresToFeet(metres: number): number {
  return metres / METRES_PER_FOOT;
}

/** Area: m² → ft². @param squareMetres m² @returns ft² */
export function squareMetresToSquareFeet(squareMetres: number): number {
  return squareMetres / SQUARE_METRES_PER_SQUARE_FOOT;
}

/** Area: ft² → m². @param squareFeet ft² @returns m² */
export function squareFeetToSquareMetres(squareFeet: number): number {
  return squareFeet * SQUARE_METRES_PER_SQUARE_FOOT;
}

/** Heat flow: W → BTU/h (International Table BTU). @param watts W @returns BTU/h */
export function wattsToBtuPerHour(watts: number): number {
  return watts * BTU_PER_HOUR_PER_WATT;
}

/** Heat flow: BTU/h → W. @param btuPerHour BTU/h @returns W */
export function btuPerHourToWatts(btuPerHour: number): number {
  return btuPerHour / BTU_PER_HOUR_PER_WATT;
}

/** The two ways figures can be shown: SI throughout ('si'), or imperial lengths, areas and heat flows. */
export type UnitSystem = 'si' | 'imperial';

/** A length in m shown in the chosen system: the value and its unit symbol. */
export function displayLength(metres: number, system: UnitSystem): { value: number; unit: 'm' | 'ft' } {
  return system === 'imperial' ? { value: metresToFeet(metres), unit: 'ft' } : { value: metres, unit: 'm' };
}

/** An area in m² shown in the chosen system. */
export function displayArea(squareMetres: number, system: UnitSystem): { value: number; unit: 'm²' | 'ft²' } {
  return system === 'imperial' ? { value: squareMetresToSquareFeet(squareMetres), unit: 'ft²' } : { value: squareMetres, unit: 'm²' };
}

/** A heat flow in W shown in the chosen system. */
export function displayHeat(watts: number, system: UnitSystem): { value: number; unit: 'W' | 'BTU/h' } {
  return system === 'imperial' ? { value: wattsToBtuPerHour(watts), unit: 'BTU/h' } : { value: watts, unit: 'W' };
}
