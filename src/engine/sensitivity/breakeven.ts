import type { Scenario } from '../../contracts/scenario';
import { MAX_PRICE_PER_KWH } from '../../contracts/sensitivity';
import type { BreakevenEfficacySettings, BreakevenPriceSettings } from '../../contracts/sensitivity';
import { compileFast, fastPresentValue } from '../fast-path';
import type { Decimal } from '../money';
import { maxEfficacyFactor, optionIndexOf } from './checks';
import { ledgerPresentValues, withPrice } from './ledger-values';
import { bisectBoundary, bracketedRoot } from './roots';

/** Format tag of a break-even result, version 1. */
export const BREAKEVEN_FORMAT = 'photon-parity/breakeven@1';

/** Why a break-even price is missing: equal at every price, never equal, or equal outside 0–100 per kWh. */
export type NoBreakevenReason = 'equal-at-every-price' | 'never-equal' | 'outside-range';

/** Break-even electricity price between two options, with how it was found and checked. */
export interface PriceBreakeven {
  a: string;
  b: string;
  /** year-1 price per kWh at which PV(a) = PV(b); null when none in [0, 100] */
  pricePerKwh: number | null;
  /** the same price as full-precision decimal text, from the closed form */
  exact: string | null;
  reason: NoBreakevenReason | null;
  /** price found independently by bisection on the fast path, per kWh (null when no sign change) */
  bracketed: number | null;
  /** true when the bisection agrees with the closed form to 1e-9 per kWh (or both find none) */
  verified: boolean;
}

/**
 * Break-even electricity price of options a and b. For a fixed scenario each present value is
 * affine in the year-1 price, PV = α + β × price (energy and cooling scale with it, escalation
 * included; capital, demand and lamps do not), so α and β come from the decimal ledger at prices 0
 * and 1 and the price is (α_b − α_a) / (β_a − β_b), kept in decimals. Bisection on the fast path
 * over [0, 100] checks it.
 */
export function breakevenPrice(s: Scenario, settings: BreakevenPriceSettings): PriceBreakeven {
  const ia = optionIndexOf(s, settings.a);
  const ib = optionIndexOf(s, settings.b);
  if (ia < 0 || ib < 0) throw new RangeError(`no option "${ia < 0 ? settings.a : settings.b}"`);
  const at0 = ledgerPresentValues(withPrice(s, '0'));
  const at1 = ledgerPresentValues(withPrice(s, '1'));
  const intercept = at0[ia]!.minus(at0[ib]!);
  const slope = at1[ia]!.minus(at0[ia]!).minus(at1[ib]!.minus(at0[ib]!));

  let exact: Decimal | null = null;
  let reason: NoBreakevenReason | null = null;
  if (slope.isZero()) reason = intercept.isZero() ? 'equal-at-every-price' : 'never-equal';
  else {
    const p = intercept.neg().div(slope);
    if (p.lt(0) || p.gt(MAX_PRICE_PER_KWH)) reason = 'outside-range';
    else exact = p;
  }

  const fast = compileFast(s);
  const gap = (price: number) => fastPresentValue(fast, ia, price) - fastPresentValue(fast, ib, price);
  const bracketed = reason === 'equal-at-every-price' ? null : bracketedRoot(gap, 0, MAX_PRICE_PER_KWH);
  const verified = exact === null ? bracketed === null || reason === 'equal-at-every-price' : bracketed !== null && Math.abs(bracketed - exact.toNumber()) <= 1e-9;
  return {
    a: settings.a,
    b: settings.b,
    pricePerKwh: exact ? exact.toNumber() : null,
    exact: exact ? exact.toString() : null,
    reason,
    bracketed,
    verified,
  };
}

/** Break-even efficacy multiplier of one option against another at the scenario's price. */
export interface EfficacyBreakeven {
  vary: string;
  against: string;
  /**
   * Smallest multiplier in [lo, hi] at which PV(vary) ≤ PV(against); null when vary is dearer
   * across the range, or already no dearer at lo.
   */
  factor: number | null;
  /** "crossing": the two present values are equal there; "step": whole fixture counts jump past equality there */
  kind: 'crossing' | 'step' | null;
  /** PV(vary) − PV(against) at factor, currency (≤ 0; about 0 for a crossing) */
  gapAtFactor: number | null;
  /** the range searched, after capping hi at the physical efficacy limit */
  searched: [number, number];
}

/**
 * Break-even efficacy multiplier by bisection on the fast path. PV(vary) never rises with the
 * multiplier (fewer fixtures give the same light), so the set where it is no dearer than the other
 * option is an interval reaching up to hi; bisection finds its lower end to 1e-14 relative. With
 * fixtureCount "whole" the count falls in steps and PV(vary) jumps at each step, so the two present
 * values may never be equal: the result is then the step at which vary becomes no dearer ("step"),
 * placed 1e-12 relative above the step.
 */
export function breakevenEfficacy(s: Scenario, settings: BreakevenEfficacySettings): EfficacyBreakeven {
  const iv = optionIndexOf(s, settings.vary);
  const io = optionIndexOf(s, settings.against);
  if (iv < 0 || io < 0) throw new RangeError(`no option "${iv < 0 ? settings.vary : settings.against}"`);
  const fast = compileFast(s);
  const other = fastPresentValue(fast, io, fast.pricePerKwh);
  const gap = (f: number) => fastPresentValue(fast, iv, fast.pricePerKwh, f) - other;
  const lo = settings.lo;
  const hi = Math.min(settings.hi, maxEfficacyFactor(s, iv));
  const none = { vary: settings.vary, against: settings.against, factor: null, kind: null, gapAtFactor: null, searched: [lo, hi] as [number, number] };
  if (hi <= lo || gap(lo) <= 0 || gap(hi) > 0) return none;
  const [, above] = bisectBoundary((f) => gap(f) <= 0, lo, hi);
  const scale = Math.max(Math.abs(other), 1);
  if (Math.abs(gap(above)) <= 1e-9 * scale) return { ...none, factor: above, kind: 'crossing', gapAtFactor: gap(above) };
  // At a step, leveling by another route (the decimal ledger's) may round the count the other way
  // within a few ulps of the step; 1e-12 above it, every route counts the smaller number of fixtures.
  const factor = Math.min(hi, above * (1 + 1e-12));
  return { ...none, factor, kind: 'step', gapAtFactor: gap(factor) };
}

/** The `photon-parity/breakeven@1` document for a price break-even. */
export function breakevenDocument(r: PriceBreakeven): { format: typeof BREAKEVEN_FORMAT; a: string; b: string; pricePerKwh: number | null } {
  return { format: BREAKEVEN_FORMAT, a: r.a, b: r.b, pricePerKwh: r.pricePerKwh };
}
