import type { Scenario } from '../../contracts/scenario';
import type { UncertaintySettings } from '../../contracts/sensitivity';
import { compileFast, fastPresentValue } from '../fast-path';
import type { FastScenario } from '../fast-path';
import { compileDraw, routeOf } from './draw-route';
import type { DrawRoute } from './draw-route';
import { pathKeys, setAt } from './inputs';
import { seedXoshiro128, unitInterval, xoshiro128ssNext } from './prng';
import { quantileSorted } from './quantile';
import { triangularQuantile } from './triangular';


/** An uncertainty run prepared for chunked evaluation: plain data, so it can cross to a worker. */
export interface UncertaintyPlan {
  scenario: Scenario;
  settings: UncertaintySettings;
  ids: string[];
  /** field path keys of each drawn input */
  keys: (string | number)[][];
  /** how each drawn input reaches the fast path */
  routes: DrawRoute[];
  /** the scenario compiled as entered */
  baseFast: FastScenario;
  /** true when a drawn input changes the scenario-wide figures of the fast path (rates, area, target, cooling…) */
  scenarioDrawn: boolean;
  /** indices of options whose compiled figures a drawn input changes (all of them for utilization or the schedule) */
  optionsDrawn: number[];
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
  const routes = settings.inputs.map((r) => routeOf(s, r.path));
  const drawnOptions = new Set<number>();
  let scenarioDrawn = false;
  settings.inputs.forEach((r, j) => {
    if (routes[j]!.kind !== 'field') return;
    const option = /^options\[(\d+)\]/.exec(r.path);
    if (option) drawnOptions.add(Number(option[1]));
    else if (r.path.startsWith('schedule')) {
      scenarioDrawn = true;
      s.options.forEach((_, i) => drawnOptions.add(i));
    } else scenarioDrawn = true;
  });
  return {
    scenario: s,
    settings,
    ids: s.options.map((o) => o.id),
    keys: settings.inputs.map((r) => pathKeys(r.path)),
    routes,
    baseFast: compileFast(s),
    scenarioDrawn,
    optionsDrawn: [...drawnOptions].sort((a, b) => a - b),
  };
}

/**
 * Draws from..to−1. Draw k takes outputs k·D … k·D + D − 1 of the seeded stream (D = number of
 * inputs), one per input in the order given, so any split into chunks gives the same numbers. Each
 * value comes from the triangular distribution (low, likely, high); money fields are set as numbers,
 * which the fast path reads the same way as decimal text. The draw is priced by compileFast and
 * fastPresentValue, the ledger's cash flows (see compileDraw).
 */
export function uncertaintyDraws(plan: UncertaintyPlan, from: number, to: number): UncertaintyChunk {
  const { scenario, settings, keys, routes, ids } = plan;
  const last = Math.min(to, settings.draws);
  const count = Math.max(0, last - from);
  const inputs = settings.inputs;
  const state = seedXoshiro128(settings.seed);
  for (let k = 0; k < from * inputs.length; k++) xoshiro128ssNext(state);
  const presentValue = ids.map(() => new Float64Array(count));
  const cheapestCount = ids.map(() => 0);
  const basePrice = Number(scenario.electricity.pricePerKwh);
  const factors = new Float64Array(ids.length);
  for (let k = 0; k < count; k++) {
    let s = scenario;
    let price = basePrice;
    factors.fill(1);
    for (let j = 0; j < inputs.length; j++) {
      const r = inputs[j]!;
      const v = triangularQuantile(unitInterval(xoshiro128ssNext(state)), r.low, r.likely, r.high);
      const route = routes[j]!;
      if (route.kind === 'price') price = v;
      else if (route.kind === 'factor') factors[route.option]! *= v / route.entered;
      else if (route.kind === 'factor-all') for (let i = 0; i < ids.length; i++) factors[i]! *= v / route.entered;
      else s = setAt(s, keys[j]!, v);
    }
    const fs = compileDraw(plan, s);
    let best = 0;
    let bestPv = Infinity;
    for (let i = 0; i < ids.length; i++) {
      const pv = fastPresentValue(fs, i, price, factors[i]);
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
