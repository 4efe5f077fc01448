import type { Scenario } from '../../contracts/scenario';
import type { SweepAxis, SweepSettings } from '../../contracts/sensitivity';
import { compileFast, fastPresentValue } from '../fast-path';
import type { FastScenario } from '../fast-path';
import { optionIndexOf } from './checks';

/** Format tag of a sweep result, version 1. */
export const SWEEP_FORMAT = 'photon-parity/sweep@1';

/** `photon-parity/sweep@1`: present values on a grid of electricity price × efficacy multiplier. */
export interface SweepResult {
  format: typeof SWEEP_FORMAT;
  /** id of the option whose efficacy is multiplied */
  vary: string;
  /** electricity prices in year 1, per kWh */
  tariffs: number[];
  /** multipliers on the varied option's photon output; 1 = as entered */
  efficacyFactors: number[];
  /** [tariff index][efficacy index]: id with the lowest present value (first in file order on a tie) */
  winner: string[][];
  /** option id → [tariff index][efficacy index] → present value in the scenario's currency */
  presentValue: Record<string, number[][]>;
}

/** A sweep ready to run in chunks of tariff rows: plain data, so it can cross to a worker. */
export interface SweepPlan {
  fast: FastScenario;
  varyIndex: number;
  ids: string[];
  /** per kWh */
  tariffs: number[];
  efficacyFactors: number[];
}

/** Rows from..to−1 of a sweep (tariff indices). */
export interface SweepRows {
  from: number;
  to: number;
  /** [row − from][efficacy index] */
  winner: string[][];
  /** [option index][row − from][efficacy index], currency */
  presentValue: number[][][];
}

/**
 * The n values of an axis, evenly spaced: (lo × (n − 1 − i) + hi × i) / (n − 1), so the first is
 * exactly lo and the last exactly hi.
 * @returns values in the axis's unit (per kWh, or a plain multiplier)
 */
export function axisValues(a: SweepAxis): number[] {
  if (a.n === 1) return [a.lo];
  const gaps = a.n - 1;
  return Array.from({ length: a.n }, (_, i) => (i === gaps ? a.hi : (a.lo * (gaps - i) + a.hi * i) / gaps));
}

/** Compiles a validated scenario and checked settings (see checkSweepSettings) into a sweep plan. */
export function planSweep(s: Scenario, settings: SweepSettings): SweepPlan {
  const varyIndex = optionIndexOf(s, settings.vary);
  if (varyIndex < 0) throw new RangeError(`no option "${settings.vary}"`);
  return {
    fast: compileFast(s),
    varyIndex,
    ids: s.options.map((o) => o.id),
    tariffs: axisValues(settings.tariff),
    efficacyFactors: axisValues(settings.efficacy),
  };
}

/**
 * Computes tariff rows from..to−1 of a sweep on the fast path (fastPresentValue: the ledger's cash
 * flows in floating point). Options other than the varied one depend on the price only, so they
 * are priced once per row.
 */
export function sweepRows(plan: SweepPlan, from: number, to: number): SweepRows {
  const { fast, varyIndex, ids, tariffs, efficacyFactors } = plan;
  const last = Math.min(to, tariffs.length);
  const presentValue: number[][][] = ids.map(() => []);
  const winner: string[][] = [];
  for (let t = from; t < last; t++) {
    const price = tariffs[t]!;
    const fixed = ids.map((_, i) => (i === varyIndex ? 0 : fastPresentValue(fast, i, price)));
    const rows = ids.map(() => new Array<number>(efficacyFactors.length));
    const winners = new Array<string>(efficacyFactors.length);
    for (let e = 0; e < efficacyFactors.length; e++) {
      let best = 0;
      let bestPv = Infinity;
      for (let i = 0; i < ids.length; i++) {
        const pv = i === varyIndex ? fastPresentValue(fast, i, price, efficacyFactors[e]) : fixed[i]!;
        rows[i]![e] = pv;
        if (pv < bestPv) {
          bestPv = pv;
          best = i;
        }
      }
      winners[e] = ids[best]!;
    }
    rows.forEach((r, i) => presentValue[i]!.push(r));
    winner.push(winners);
  }
  return { from, to: last, winner, presentValue };
}

/** Joins row chunks, in any order, into the `photon-parity/sweep@1` result. */
export function assembleSweep(plan: SweepPlan, chunks: readonly SweepRows[]): SweepResult {
  const ordered = [...chunks].sort((x, y) => x.from - y.from);
  const presentValue: Record<string, number[][]> = {};
  plan.ids.forEach((id, i) => {
    presentValue[id] = ordered.flatMap((c) => c.presentValue[i]!);
  });
  return {
    format: SWEEP_FORMAT,
    vary: plan.ids[plan.varyIndex]!,
    tariffs: plan.tariffs,
    efficacyFactors: plan.efficacyFactors,
    winner: ordered.flatMap((c) => c.winner),
    presentValue,
  };
}

/**
 * Runs a whole sweep in chunks of rows, calling onProgress(done, total) after each chunk.
 * @param rowsPerChunk tariff rows per chunk
 */
export function runSweep(
  s: Scenario,
  settings: SweepSettings,
  onProgress?: (doneRows: number, totalRows: number) => void,
  rowsPerChunk = 20,
): SweepResult {
  const plan = planSweep(s, settings);
  const chunks: SweepRows[] = [];
  for (let from = 0; from < plan.tariffs.length; from += rowsPerChunk) {
    chunks.push(sweepRows(plan, from, from + rowsPerChunk));
    onProgress?.(Math.min(from + rowsPerChunk, plan.tariffs.length), plan.tariffs.length);
  }
  return assembleSweep(plan, chunks);
}
