import { z } from '../../../contracts/zod-messages';
import type { Scenario } from '../../../contracts/scenario';
import { maxEfficacyFactor } from '../../../engine/sensitivity/checks';
import { numericInputs } from '../../../engine/sensitivity/inputs';

const text = z.string().catch('');
const rowSchema = z.object({ path: z.string(), low: text, likely: text, high: text });

/**
 * A person's analysis settings for one scenario, as the forms hold them (text as typed, so a half-typed
 * value survives a reload). Each section falls back to its defaults when what was stored is unreadable.
 */
export const analysisSettingsSchema = z.object({
  version: z.literal(1),
  sweep: z.object({ vary: z.string(), tariffLo: text, tariffHi: text, tariffN: text, factorLo: text, factorHi: text, factorN: text, showValueOf: z.string() }),
  swings: z.object({ pct: text, measure: z.enum(['option', 'gap']), a: z.string(), b: z.string() }),
  breakeven: z.object({ a: z.string(), b: z.string() }),
  uncertainty: z.object({ seed: text, draws: text, inputs: z.array(rowSchema) }),
});
export type AnalysisSettings = z.infer<typeof analysisSettingsSchema>;
export type SweepDraft = AnalysisSettings['sweep'];
export type SwingsDraft = AnalysisSettings['swings'];
export type BreakevenDraft = AnalysisSettings['breakeven'];
export type UncertaintyDraft = AnalysisSettings['uncertainty'];
export type UncertaintyRowDraft = UncertaintyDraft['inputs'][number];

/** Four significant figures, as text without trailing zeros. */
export const sig4 = (v: number): string => String(Number(v.toPrecision(4)));

/** A seed for a new run: 0 … 2³² − 1 from the browser's generator (the draws themselves use the seeded one). */
export function freshSeed(): number {
  const a = new Uint32Array(1);
  globalThis.crypto.getRandomValues(a);
  return a[0]!;
}

/** A low, likely and high row around an input's value, by relative moves. */
export function rowAround(path: string, value: number, down: number, up: number): UncertaintyRowDraft {
  return { path, low: sig4(value * (1 - down)), likely: sig4(value), high: sig4(value * (1 + up)) };
}

/**
 * Starting settings for a scenario: a sweep from a price of 0 to 2.5 times today's, the first
 * candidate's efficacy from half to twice (capped at the physical limit), swings of ±20 %, and an
 * uncertainty run over the price and every option's efficacy. These are starting points to edit.
 */
export function defaultAnalysisSettings(s: Scenario, seed = freshSeed()): AnalysisSettings {
  const candidate = s.options.find((o) => o.id !== s.baseline)?.id ?? s.baseline;
  const price = Number(s.electricity.pricePerKwh);
  const vary = s.options.findIndex((o) => o.id === candidate);
  const top = Math.min(2, Math.floor(maxEfficacyFactor(s, vary) * 100) / 100);
  const efficacyRows = numericInputs(s)
    .filter((i) => /^options\[\d+\]\.(photonEfficacy|ppf)$/.test(i.path))
    .map((i) => rowAround(i.path, i.value, 0.1, Math.min(0.05, i.bounds.max / i.value - 1)));
  return {
    version: 1,
    sweep: {
      vary: candidate,
      tariffLo: '0',
      tariffHi: sig4(Math.max(0.1, price * 2.5)),
      tariffN: '100',
      factorLo: '0.5',
      factorHi: String(top),
      factorN: '100',
      showValueOf: candidate,
    },
    swings: { pct: '20', measure: 'option', a: s.baseline, b: candidate },
    breakeven: { a: s.baseline, b: candidate },
    uncertainty: {
      seed: String(seed),
      draws: '10000',
      inputs: [rowAround('electricity.pricePerKwh', price, 0.2, 0.3), ...efficacyRows],
    },
  };
}

/** Stored settings made to fit the scenario as it is now: option ids that no longer exist fall back to the defaults'. */
export function fitToScenario(stored: AnalysisSettings, s: Scenario, defaults: AnalysisSettings): AnalysisSettings {
  const ids = new Set(s.options.map((o) => o.id));
  const id = (v: string, fallback: string) => (ids.has(v) ? v : fallback);
  const paths = new Set(numericInputs(s).map((i) => i.path));
  const d = defaults;
  return {
    ...stored,
    sweep: { ...stored.sweep, vary: id(stored.sweep.vary, d.sweep.vary), showValueOf: id(stored.sweep.showValueOf, d.sweep.showValueOf) },
    swings: { ...stored.swings, a: id(stored.swings.a, d.swings.a), b: id(stored.swings.b, d.swings.b) },
    breakeven: { a: id(stored.breakeven.a, d.breakeven.a), b: id(stored.breakeven.b, d.breakeven.b) },
    uncertainty: { ...stored.uncertainty, inputs: stored.uncertainty.inputs.filter((r) => paths.has(r.path)) },
  };
}
