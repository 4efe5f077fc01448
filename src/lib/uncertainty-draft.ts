import type { AnalysisSettings } from '../contracts/api/analysis';
import { check } from '../contracts/problems';
import type { Problem } from '../contracts/problems';
import type { Scenario } from '../contracts/scenario';
import { uncertaintySettingsSchema } from '../contracts/sensitivity';
import type { UncertaintySettings } from '../contracts/sensitivity';
import { checkUncertaintySettings } from '../engine/sensitivity/checks';

/** Uncertainty settings as kept with a scenario: text as typed. */
export type UncertaintyDraftText = AnalysisSettings['uncertainty'];

/** Text as typed → number: empty is "not given", a comma works as a decimal point, anything else is NaN. */
export function toNumber(t: string): number | undefined {
  const v = t.trim().replace(',', '.');
  return v === '' ? undefined : Number(v);
}

/**
 * The uncertainty settings a draft describes (unchecked). The sensitivity page and the shared
 * snapshot page both read drafts through this, so the same text gives the same draws in both.
 */
export function uncertaintyFromDraft(d: UncertaintyDraftText) {
  return {
    seed: toNumber(d.seed),
    draws: toNumber(d.draws),
    inputs: d.inputs.map((r) => ({ path: r.path, low: toNumber(r.low), likely: toNumber(r.likely), high: toNumber(r.high) })),
  };
}

/** A draft checked by the shared schema, then against the scenario: runnable settings, or every problem. */
export function checkUncertaintyDraft(s: Scenario, d: UncertaintyDraftText): { ok: true; settings: UncertaintySettings } | { ok: false; problems: Problem[] } {
  const parsed = check(uncertaintySettingsSchema, uncertaintyFromDraft(d));
  if (!parsed.ok) return { ok: false, problems: parsed.problems };
  const problems = checkUncertaintySettings(s, parsed.value);
  return problems.length ? { ok: false, problems } : { ok: true, settings: parsed.value };
}
