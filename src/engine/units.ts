/**
 * Branded quantities: the same number with different units cannot be passed where the other is
 * expected without an explicit cast, so a swapped argument is a type error.
 */
declare const unit: unique symbol;
type Quantity<U extends string> = number & { readonly [unit]: U };

/** Electrical power, W. */
export type Watts = Quantity<'W'>;
/** Photon efficacy, µmol of PAR photons per joule. */
export type MicromolePerJoule = Quantity<'µmol/J'>;
/** Photon flux, µmol/s. */
export type MicromolePerSecond = Quantity<'µmol/s'>;
/** Photosynthetic photon flux density, µmol m⁻² s⁻¹. */
export type Ppfd = Quantity<'µmol m⁻² s⁻¹'>;
/** Daily light integral, mol m⁻² d⁻¹. */
export type Dli = Quantity<'mol m⁻² d⁻¹'>;
/** Area, m². */
export type SquareMetres = Quantity<'m²'>;
/** Duration, hours. */
export type Hours = Quantity<'h'>;
/** Energy, kWh. */
export type KilowattHours = Quantity<'kWh'>;
/** A dimensionless ratio such as 0.9 (not a percentage). */
export type Fraction = Quantity<'1'>;

/** Marks a plain number as a quantity of the given kind; the one sanctioned cast. */
export const as = <Q extends number>(value: number): Q => value as Q;
