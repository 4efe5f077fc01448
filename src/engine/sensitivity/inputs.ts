import type { Scenario } from '../../contracts/scenario';
import { MAX_PHOTON_EFFICACY } from '../../contracts/scenario';

/** Where a numeric input may go while the scenario stays valid under the scenario schema. */
export interface InputBounds {
  min: number;
  /** false when the value must stay strictly above min */
  minInclusive: boolean;
  max: number;
  /** whole numbers only (horizonYears) */
  integer: boolean;
}

/**
 * One numeric field of a scenario that sensitivity runs may move: the spectrum summary is left out
 * because no cost depends on it, and so are identifiers, labels and switches.
 */
export interface NumericInput {
  /** field path as Problem lines write it, e.g. `options[2].lamp.price` */
  path: string;
  /** money is decimal text in the scenario; number is a plain number */
  kind: 'money' | 'number';
  /** display unit, e.g. "per kWh", "%", "W" */
  unit: string;
  /** the value as entered */
  value: number;
  bounds: InputBounds;
}

type Key = string | number;

/** Splits `options[2].lamp.price` into ['options', 2, 'lamp', 'price']. */
export function pathKeys(path: string): Key[] {
  return (path.match(/[^.[\]]+/g) ?? []).map((k) => (/^\d+$/.test(k) ? Number(k) : k));
}

/** Reads the value at a path, or undefined when the path does not exist. */
export function getAt(root: unknown, keys: readonly Key[]): unknown {
  let node = root;
  for (const k of keys) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<Key, unknown>)[k];
  }
  return node;
}

/** Returns a copy of root with value at the path; only the objects along the path are copied. */
export function setAt<T>(root: T, keys: readonly Key[], value: unknown, from = 0): T {
  if (from === keys.length) return value as T;
  const k = keys[from]!;
  if (Array.isArray(root)) {
    const copy = root.slice();
    copy[k as number] = setAt(copy[k as number], keys, value, from + 1);
    return copy as T;
  }
  const rec = root as Record<Key, unknown>;
  return { ...rec, [k]: setAt(rec[k], keys, value, from + 1) } as T;
}

const range = (min: number, max: number, minInclusive = false, integer = false): InputBounds => ({ min, max, minInclusive, integer });

/**
 * Every numeric input of a validated scenario that enters the costs, with the range the scenario
 * schema allows for it given the other fields (a phase's days leave room for the other phases'
 * days within 366; wall watts and ppf keep ppf / wallWatts within the physical limit).
 */
export function numericInputs(s: Scenario): NumericInput[] {
  const out: NumericInput[] = [];
  const add = (path: string, kind: NumericInput['kind'], unit: string, value: number, bounds: InputBounds) =>
    out.push({ path, kind, unit, value, bounds });
  add('electricity.pricePerKwh', 'money', 'per kWh', Number(s.electricity.pricePerKwh), range(0, Infinity, true));
  add('electricity.escalationPctPerYear', 'number', '% per year', s.electricity.escalationPctPerYear, range(-50, 50, true));
  add('electricity.demandChargePerKwMonth', 'money', 'per kW-month', Number(s.electricity.demandChargePerKwMonth), range(0, Infinity, true));
  add('discountRatePct', 'number', '% per year', s.discountRatePct, range(0, 100, true));
  add('utilization', 'number', 'fraction', s.utilization, range(0, 1));
  add('canopy.lengthM', 'number', 'm', s.canopy.lengthM, range(0, 1000));
  add('canopy.widthM', 'number', 'm', s.canopy.widthM, range(0, 1000));
  if (s.target.ppfd !== undefined) add('target.ppfd', 'number', 'µmol m⁻² s⁻¹', s.target.ppfd, range(0, 3000));
  if (s.target.dli !== undefined) add('target.dli', 'number', 'mol m⁻² d⁻¹', s.target.dli, range(0, 100));
  const days = s.schedule.reduce((sum, r) => sum + r.daysPerYear, 0);
  s.schedule.forEach((r, i) => {
    add(`schedule[${i}].hoursPerDay`, 'number', 'h', r.hoursPerDay, range(0, 24));
    add(`schedule[${i}].daysPerYear`, 'number', 'days', r.daysPerYear, range(0, 366 - (days - r.daysPerYear)));
  });
  add('horizonYears', 'number', 'years', s.horizonYears, range(1, 30, true, true));
  if (s.cooling) {
    add('cooling.cop', 'number', '', s.cooling.cop, range(0, 20));
    add('cooling.share', 'number', 'fraction', s.cooling.share, range(0, 1, true));
  }
  s.options.forEach((o, i) => {
    const p = `options[${i}]`;
    const wattsMin = o.ppf !== undefined ? o.ppf / MAX_PHOTON_EFFICACY : 0;
    add(`${p}.wallWatts`, 'number', 'W', o.wallWatts, range(wattsMin, 100_000, o.ppf !== undefined));
    if (o.photonEfficacy !== undefined) add(`${p}.photonEfficacy`, 'number', 'µmol/J', o.photonEfficacy, range(0, MAX_PHOTON_EFFICACY));
    if (o.ppf !== undefined) add(`${p}.ppf`, 'number', 'µmol/s', o.ppf, range(0, Math.min(10_000_000, o.wallWatts * MAX_PHOTON_EFFICACY)));
    if (o.fixturePrice !== undefined) add(`${p}.fixturePrice`, 'money', 'per fixture', Number(o.fixturePrice), range(0, Infinity, true));
    add(`${p}.installPrice`, 'money', 'per fixture', Number(o.installPrice), range(0, Infinity, true));
    add(`${p}.rebate`, 'money', 'per fixture', Number(o.rebate), range(0, Infinity, true));
    if (o.lamp) {
      add(`${p}.lamp.price`, 'money', 'per lamp set', Number(o.lamp.price), range(0, Infinity, true));
      add(`${p}.lamp.replaceEveryHours`, 'number', 'h', o.lamp.replaceEveryHours, range(0, 1_000_000));
      add(`${p}.lamp.outputAtReplacementPct`, 'number', '%', o.lamp.outputAtReplacementPct, range(0, 100));
    } else {
      add(`${p}.outputAtHorizonPct`, 'number', '%', o.outputAtHorizonPct, range(0, 100));
    }
  });
  return out;
}

/**
 * Moves a value into an input's bounds (and to the nearest whole number where required). Exclusive
 * minimums are all 0, which a relative move of less than 100 % from a positive value never reaches.
 */
export function clampToBounds(value: number, b: InputBounds): number {
  let v = b.integer ? Math.round(value) : value;
  if (v > b.max) v = b.max;
  if (b.minInclusive && v < b.min) v = b.min;
  return v;
}

/** True when a value lies inside an input's bounds. */
export function withinBounds(value: number, b: InputBounds): boolean {
  const aboveMin = b.minInclusive ? value >= b.min : value > b.min;
  return aboveMin && value <= b.max && (!b.integer || Number.isInteger(value));
}
