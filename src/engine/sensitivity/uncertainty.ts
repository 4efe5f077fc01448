import type { Scenario } from '../../contracts/scenario';
import type { UncertaintySettings } from '../../contracts/sensitivity';
import { compileFast, fastPresentValue } from '../fast-path';
import type { FastScenario } from '../fast-path';
import { pathKeys, setAt } from './inputs';
import { seedXoshiro128, unitInterval, xoshiro128ssNext } from './prng';
import { quantileSorted } from './quantile';
import { triangularQuantile } from './triangular';

const PRICE_PATH = 'electricity.pricePerKwh';

/** An uncertainty run prepared for chunked evaluation: plain data, so it can cross to a worker. */
export interface UncertaintyPlan {
  scenario: Scenario;
  settings: UncertaintySettings;
  ids: string[];
  /** field path keys of each drawn input */
  keys: (string | number)[][];
  /** position of the electricity price among the inputs, or −1; it is passed to the fast path directly */
  priceInput: number;
  /** the compiled scenario when the price is the only input drawn, else null (each draw compiles its own) */
  fixedFast: FastScenario | null;
}

/** Draws from..to−1 of a run. */
export interface UncertaintyChunk {
  from: number;
  to: number;
  /** [option index][draw − from]: present value, currency */
  presentValue: Float64Array[];
  /** [option index]: draws in this chunk where the option was cheapest (first in file order on a tie) */
  cheapestCount: number[];
}

/** Summary of one option over all draws. */
export interface UncertaintyOption {
  id: string;
  /** share of draws in which this option had the lowest present value, 0 … 1 */
  chanceCheapest: number;
  /** quantiles of the present value (Hyndman and Fan 1996, definition 7), currency */
  p10: number;
  p50: number;
  p90: number;
  /** arithmetic mean of the present value, currency */
  mean: number;
}

/** Result of an uncertainty run: the same seed and settings give the same numbers on every machine. */
export interface UncertaintySummary {
  seed: number;
  draws: number;
  quantileDefinition: 'hyndman-fan-7';
  options: UncertaintyOption[];
}

/** Prepares an uncertainty run from a validated scenario and settings checked by checkUncertaintySettings. */
export function planUncertainty(s: Scenario, settings: UncertaintySettings): UncertaintyPlan {
  const priceInput = settings.inputs.findIndex((r) => r.path === PRICE_PATH);
  return {
    scenario: s,
    settings,
    ids: s.options.map((o) => o.id),
    keys: settings.inputs.map((r) => pathKeys(r.path)),
    priceInput,
    fixedFast: settings.inputs.length === 1 && priceInput === 0 ? compileFast(s) : null,
  };
}

/**
 * Draws from..to−1. Draw k takes outputs k·D … k·D + D − 1 of the seeded stream (D = number of
 * inputs), one per input in the order given, so any split into chunks gives the same numbers. Each
 * value comes from the triangular distribution (low, likely, high); money fields are set as numbers,
 * which the fast path reads the same way as decimal text. The draw is priced by compileFast and
 * fastPresentValue, the ledger's cash flows.
 */
export function uncertaintyDraws(plan: UncertaintyPlan, from: number, to: number): UncertaintyChunk {
  const { scenario, settings, keys, priceInput, fixedFast, ids } = plan;
  const last = Math.min(to, settings.draws);
  const count = Math.max(0, last - from);
  const inputs = settings.inputs;
  const state = seedXoshiro128(settings.seed);
  for (let k = 0; k < from * inputs.length; k++) xoshiro128ssNext(state);
  const presentValue = ids.map(() => new Float64Array(count));
  const cheapestCount = ids.map(() => 0);
  const basePrice = Number(scenario.electricity.pricePerKwh);
  for (let k = 0; k < count; k++) {
    let s = scenario;
    let price = basePrice;
    for (let j = 0; j < inputs.length; j++) {
      const r = inputs[j]!;
      const v = triangularQuantile(unitInterval(xoshiro128ssNext(state)), r.low, r.likely, r.high);
      if (j === priceInput) price = v;
      else s = setAt(s, keys[j]!, v);
    }
    const fs = fixedFast ?? compileFast(s);
    let best = 0;
    let bestPv = Infinity;
    for (let i = 0; i < ids.length; i++) {
      const pv = fastPresentValue(fs, i, price);
      presentValue[i]![k] = pv;
      if (pv < bestPv) {
        bestPv = pv;
        best = i;
      }
    }
    cheapestCount[best]! += 1;
  }
  return { from, to: from + count, presentValue, cheapestCount };
}

/** Joins chunks covering every draw (in any order) into chances and quantiles. */
export function summarizeUncertainty(plan: UncertaintyPlan, chunks: readonly UncertaintyChunk[]): UncertaintySummary {
  const n = plan.settings.draws;
  const covered = chunks.reduce((sum, c) => sum + (c.to - c.from), 0);
  if (covered !== n) throw new RangeError(`chunks cover ${covered} of ${n} draws`);
  const options = plan.ids.map((id, i): UncertaintyOption => {
    const all = new Float64Array(n);
    let wins = 0;
    for (const c of chunks) {
      all.set(c.presentValue[i]!, c.from);
      wins += c.cheapestCount[i]!;
    }
    let sum = 0;
    for (let k = 0; k < n; k++) sum += all[k]!;
    all.sort();
    return { id, chanceCheapest: wins / n, p10: quantileSorted(all, 0.1), p50: quantileSorted(all, 0.5), p90: quantileSorted(all, 0.9), mean: sum / n };
  });
  return { seed: plan.settings.seed, draws: n, quantileDefinition: 'hyndman-fan-7', options };
}

/** Runs every draw in chunks, calling onProgress(done, total) after each one. */
export function runUncertainty(
  s: Scenario,
  settings: UncertaintySettings,
  onProgress?: (done: number, total: number) => void,
  drawsPerChunk = 1000,
): UncertaintySummary {
  const plan = planUncertainty(s, settings);
  const chunks: UncertaintyChunk[] = [];
  for (let from = 0; from < settings.draws; from += drawsPerChunk) {
    chunks.push(uncertaintyDraws(plan, from, from + drawsPerChunk));
    onProgress?.(Math.min(from + drawsPerChunk, settings.draws), settings.draws);
  }
  return summarizeUncertainty(plan, chunks);
}
