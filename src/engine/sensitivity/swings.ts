import type { Problem } from '../../contracts/problems';
import type { Scenario } from '../../contracts/scenario';
import type { SwingMeasure, SwingSettings } from '../../contracts/sensitivity';
import { compileFast, fastPresentValue } from '../fast-path';
import { dec } from '../money';
import { parseScenario } from '../parse';
import { checkOptionId } from './checks';
import { clampToBounds, getAt, numericInputs, pathKeys, setAt } from './inputs';
import type { NumericInput } from './inputs';

/** One input moved down and up, with every option's present value at both ends. */
export interface SwingRow {
  path: string;
  unit: string;
  /** value as entered */
  base: number;
  /** values used after moving by ∓pct % and clamping into the valid range */
  low: number;
  high: number;
  /** true when clamping or rounding changed low or high */
  clamped: boolean;
  /** present value of each option (scenario order) at low and at high, currency */
  presentValueLow: number[];
  presentValueHigh: number[];
  /** the ranking measure at low and high, and the size |high − low| it is ranked by */
  measureLow: number;
  measureHigh: number;
  size: number;
}

/** A swing run prepared for chunked evaluation: plain data. */
export interface SwingPlan {
  scenario: Scenario;
  inputs: NumericInput[];
  pct: number;
  measure: SwingMeasure;
  ids: string[];
  /** present value of each option as entered, currency */
  basePresentValue: number[];
}

/** The ranked swings, largest first, and any swung scenario that failed validation (none expected). */
export interface SwingResult {
  pct: number;
  measure: SwingMeasure;
  ids: string[];
  basePresentValue: number[];
  baseMeasure: number;
  rows: SwingRow[];
  invalid: { path: string; problems: Problem[] }[];
}

/** Problems of swing settings against a scenario (unknown option ids in the measure). */
export function checkSwingSettings(s: Scenario, settings: SwingSettings): Problem[] {
  const m = settings.measure;
  if (!m) return [];
  if (m.kind === 'option') return checkOptionId(s, m.id, 'measure.id');
  return [...checkOptionId(s, m.a, 'measure.a'), ...checkOptionId(s, m.b, 'measure.b'), ...(m.a === m.b ? [{ path: 'measure.b', message: 'must differ from a' }] : [])];
}

/** The measure's value for present values in scenario order: one option's PV, or PV(a) − PV(b). */
export function measureValue(pvs: readonly number[], ids: readonly string[], m: SwingMeasure): number {
  const at = (id: string) => pvs[ids.indexOf(id)] ?? NaN;
  return m.kind === 'option' ? at(m.id) : at(m.a) - at(m.b);
}

function fastValues(s: Scenario): number[] {
  const fs = compileFast(s);
  return s.options.map((_, i) => fastPresentValue(fs, i, fs.pricePerKwh));
}

/**
 * Prepares one-at-a-time swings: every input of numericInputs (each numeric field that enters the
 * costs; the spectrum summary does not) will be moved by −pct % and +pct % of its value with all
 * others as entered. Inputs at 0 do not move under a relative swing.
 */
export function planSwings(s: Scenario, settings: SwingSettings): SwingPlan {
  const basePresentValue = fastValues(s);
  return {
    scenario: s,
    inputs: numericInputs(s),
    pct: settings.pct,
    measure: settings.measure ?? { kind: 'option', id: s.baseline },
    ids: s.options.map((o) => o.id),
    basePresentValue,
  };
}

function moved(s: Scenario, input: NumericInput, sign: 1 | -1, pct: number): { scenario: Scenario; value: number; clamped: boolean } {
  const keys = pathKeys(input.path);
  if (input.kind === 'money') {
    const text = dec(String(getAt(s, keys))).times(dec(1).plus(dec(pct).div(100).times(sign))).toString();
    return { scenario: setAt(s, keys, text), value: Number(text), clamped: false };
  }
  const raw = input.value * (1 + (sign * pct) / 100);
  const value = clampToBounds(raw, input.bounds);
  return { scenario: setAt(s, keys, value), value, clamped: value !== raw };
}

/**
 * Swings inputs from..to−1 of the plan. Each swung scenario is validated against the scenario
 * schema, then priced on the fast path (compileFast + fastPresentValue, the ledger's cash flows).
 */
export function swingRows(plan: SwingPlan, from: number, to: number): { rows: SwingRow[]; invalid: SwingResult['invalid'] } {
  const rows: SwingRow[] = [];
  const invalid: SwingResult['invalid'] = [];
  for (const input of plan.inputs.slice(from, to)) {
    const ends = ([-1, 1] as const).map((sign) => moved(plan.scenario, input, sign, plan.pct));
    const checked = ends.map((e) => parseScenario(e.scenario));
    const problems = checked.flatMap((c) => (c.ok ? [] : c.problems));
    if (problems.length > 0) {
      invalid.push({ path: input.path, problems });
      continue;
    }
    const [lowPv, highPv] = checked.map((c) => (c.ok ? fastValues(c.value) : []));
    const [lo, hi] = ends;
    const measureLow = measureValue(lowPv!, plan.ids, plan.measure);
    const measureHigh = measureValue(highPv!, plan.ids, plan.measure);
    rows.push({
      path: input.path,
      unit: input.unit,
      base: input.value,
      low: lo!.value,
      high: hi!.value,
      clamped: lo!.clamped || hi!.clamped,
      presentValueLow: lowPv!,
      presentValueHigh: highPv!,
      measureLow,
      measureHigh,
      size: Math.abs(measureHigh - measureLow),
    });
  }
  return { rows, invalid };
}

/** Re-ranks swing rows by another measure, largest |change| first (ties keep input order). */
export function rankSwings(rows: readonly SwingRow[], ids: readonly string[], m: SwingMeasure): SwingRow[] {
  return rows
    .map((r) => {
      const measureLow = measureValue(r.presentValueLow, ids, m);
      const measureHigh = measureValue(r.presentValueHigh, ids, m);
      return { ...r, measureLow, measureHigh, size: Math.abs(measureHigh - measureLow) };
    })
    .sort((x, y) => y.size - x.size);
}

/** Runs every swing, calling onProgress(done, total) after each chunk of inputs, and ranks them. */
export function runSwings(s: Scenario, settings: SwingSettings, onProgress?: (done: number, total: number) => void, perChunk = 16): SwingResult {
  const plan = planSwings(s, settings);
  const rows: SwingRow[] = [];
  const invalid: SwingResult['invalid'] = [];
  for (let from = 0; from < plan.inputs.length; from += perChunk) {
    const part = swingRows(plan, from, from + perChunk);
    rows.push(...part.rows);
    invalid.push(...part.invalid);
    onProgress?.(Math.min(from + perChunk, plan.inputs.length), plan.inputs.length);
  }
  return assembleSwings(plan, rows, invalid);
}

/** Puts the rows of every chunk together into the ranked result. */
export function assembleSwings(plan: SwingPlan, rows: SwingRow[], invalid: SwingResult['invalid']): SwingResult {
  return {
    pct: plan.pct,
    measure: plan.measure,
    ids: plan.ids,
    basePresentValue: plan.basePresentValue,
    baseMeasure: measureValue(plan.basePresentValue, plan.ids, plan.measure),
    rows: rankSwings(rows, plan.ids, plan.measure),
    invalid,
  };
}
