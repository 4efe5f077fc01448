/**
 * Conversions the scenario editor and the fixture library make when a person switches how a figure
 * is entered (PPFD ↔ DLI, efficacy ↔ PPF) or reads one figure from the other. They convert exactly
 * and keep 12 significant digits, which sheds binary floating-point noise (295.14000000000004)
 * without losing anything a person typed; switchEntry remembers the typed value so that switching
 * there and straight back gives it again exactly, even where the conversion repeats (17 / 0.0648).
 */
import { dliFromPpfd, ppfdFromDli } from './leveling';
import { as } from './units';
import type { Dli, Hours, MicromolePerJoule, MicromolePerSecond, Ppfd, Watts } from './units';

/** Significant digits kept by the entry conversions: far beyond any figure typed, well inside a double's 15–17. */
export const ENTRY_SIGNIFICANT_DIGITS = 12;

/**
 * A number rounded to 12 significant digits, to drop the noise of binary arithmetic.
 * @param value any finite number, unit unchanged
 * @returns the same quantity to 12 significant digits (non-finite values unchanged)
 */
export function shedFloatNoise(value: number): number {
  return Number.isFinite(value) ? Number(value.toPrecision(ENTRY_SIGNIFICANT_DIGITS)) : value;
}

/** How a light target is entered: as PPFD (µmol m⁻² s⁻¹) or as DLI (mol m⁻² d⁻¹). */
export type TargetMode = 'ppfd' | 'dli';

/**
 * A light target converted to the other way of entering it over a photoperiod:
 * DLI = PPFD × hours × 3600 / 10⁶ and back, to 12 significant digits.
 * @param value the target in `from` units: µmol m⁻² s⁻¹ for 'ppfd', mol m⁻² d⁻¹ for 'dli'
 * @param from the mode `value` is in; the result is in the other mode's units
 * @param hoursPerDay photoperiod, h
 * @returns mol m⁻² d⁻¹ when from = 'ppfd', µmol m⁻² s⁻¹ when from = 'dli'
 */
export function convertTarget(value: number, from: TargetMode, hoursPerDay: number): number {
  const h = as<Hours>(hoursPerDay);
  return shedFloatNoise(from === 'ppfd' ? dliFromPpfd(as<Ppfd>(value), h) : ppfdFromDli(as<Dli>(value), h));
}

/**
 * Photon flux of a fixture from its efficacy: PPF = efficacy × wall power, to 12 significant digits.
 * @param efficacy µmol/J
 * @param wallWatts W
 * @returns µmol/s
 */
export function ppfFromEfficacy(efficacy: number, wallWatts: number): MicromolePerSecond {
  return as<MicromolePerSecond>(shedFloatNoise(as<MicromolePerJoule>(efficacy) * as<Watts>(wallWatts)));
}

/**
 * Photon efficacy of a fixture from its flux: efficacy = PPF ÷ wall power, to 12 significant digits.
 * @param ppf µmol/s
 * @param wallWatts W, greater than 0
 * @returns µmol/J
 */
export function efficacyFromPpf(ppf: number, wallWatts: number): MicromolePerJoule {
  return as<MicromolePerJoule>(shedFloatNoise(ppf / wallWatts));
}

/**
 * A fixture's photon efficacy at the wall: as given, or PPF ÷ wall power.
 * @param f wallWatts in W, photonEfficacy in µmol/J, ppf in µmol/s
 * @returns µmol/J, or null when neither efficacy nor PPF is given or the wall power is not above 0
 */
export function photonEfficacyOf(f: { wallWatts: number; photonEfficacy?: number | undefined; ppf?: number | undefined }): MicromolePerJoule | null {
  if (f.photonEfficacy !== undefined) return as<MicromolePerJoule>(f.photonEfficacy);
  if (f.ppf === undefined || !(f.wallWatts > 0)) return null;
  return efficacyFromPpf(f.ppf, f.wallWatts);
}

/** The last switch of an entry between two modes: what was typed, what it became, and on what basis. */
export interface EntrySwitch<M extends string> {
  /** the mode switched from */
  from: M;
  /** the value in the `from` mode before the switch, its units */
  typed: number;
  /** the value the switch produced in the other mode, its units */
  converted: number;
  /** the figure the conversion rests on (photoperiod in h, or wall power in W) */
  basis: number;
}

/**
 * Switches an entry to its other mode. Switching straight back, with the produced value and the
 * basis untouched, returns exactly what was typed before; otherwise the value is converted.
 * @param value the entry in the `from` mode
 * @param from the mode switched from
 * @param basis the figure the conversion rests on (h or W)
 * @param convert value in `from` units → value in the other mode's units, on that basis
 * @param last the previous switch of this entry, if any
 * @returns the switch made; its `converted` is the entry's new value
 */
export function switchEntry<M extends string>(value: number, from: M, basis: number, convert: (value: number, from: M, basis: number) => number, last?: EntrySwitch<M>): EntrySwitch<M> {
  const back = last !== undefined && last.from !== from && last.converted === value && last.basis === basis;
  return { from, typed: value, converted: back ? last.typed : convert(value, from, basis), basis };
}

/** How a fixture's light output is entered: as photon efficacy (µmol/J) or as PPF (µmol/s). */
export type OutputMode = 'efficacy' | 'ppf';

/**
 * A fixture's output converted to the other way of entering it: PPF = efficacy × W and back, to 12 significant digits.
 * @param value µmol/J when from = 'efficacy', µmol/s when from = 'ppf'
 * @param wallWatts W, greater than 0
 * @returns µmol/s when from = 'efficacy', µmol/J when from = 'ppf'
 */
export function convertOutput(value: number, from: OutputMode, wallWatts: number): number {
  return from === 'efficacy' ? ppfFromEfficacy(value, wallWatts) : efficacyFromPpf(value, wallWatts);
}
