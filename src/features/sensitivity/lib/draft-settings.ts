import { check } from '../../../contracts/problems';
import type { Problem } from '../../../contracts/problems';
import type { Scenario } from '../../../contracts/scenario';
import {
  breakevenPriceSettingsSchema, sweepSettingsSchema, swingSettingsSchema, uncertaintySettingsSchema,
} from '../../../contracts/sensitivity';
import type { SwingMeasure } from '../../../contracts/sensitivity';
import { checkSweepSettings, checkUncertaintySettings } from '../../../engine/sensitivity/checks';
import { checkSwingSettings } from '../../../engine/sensitivity/swings';
import { toNumber, uncertaintyFromDraft } from '../../../lib/uncertainty-draft';
import type { BreakevenDraft, SweepDraft, SwingsDraft, UncertaintyDraft } from './analysis-settings';

export { toNumber, uncertaintyFromDraft };

/** The sweep settings a draft describes (unchecked). */
export function sweepFromDraft(d: SweepDraft) {
  return {
    vary: d.vary,
    tariff: { lo: toNumber(d.tariffLo), hi: toNumber(d.tariffHi), n: toNumber(d.tariffN) },
    efficacy: { lo: toNumber(d.factorLo), hi: toNumber(d.factorHi), n: toNumber(d.factorN) },
  };
}

/** The measure a swings draft ranks by. */
export function measureOf(d: SwingsDraft): SwingMeasure {
  return d.measure === 'option' ? { kind: 'option', id: d.a } : { kind: 'gap', a: d.a, b: d.b };
}

export function swingsFromDraft(d: SwingsDraft) {
  return { pct: toNumber(d.pct), measure: measureOf(d) };
}

export function breakevenFromDraft(d: BreakevenDraft) {
  return { a: d.a, b: d.b };
}

/** Field path → first problem there; a form shows each beside its field. */
export type FieldErrors = Record<string, string>;

function byPath(problems: Problem[]): FieldErrors {
  const out: FieldErrors = {};
  for (const p of problems) out[p.path] ??= p.message.replace(/\bLO\b/g, 'the lowest value').replace(/\bHI\b/g, 'the highest value');
  return out;
}

/** Problems of a sweep draft: the shared schema, then the engine's checks against the scenario. */
export function sweepErrors(s: Scenario, d: SweepDraft): FieldErrors {
  const raw = sweepFromDraft(d);
  const parsed = check(sweepSettingsSchema, raw);
  const hi = raw.efficacy.hi;
  const scenarioProblems = checkSweepSettings(s, { vary: d.vary, efficacy: hi === undefined || Number.isNaN(hi) ? undefined : { hi } });
  return byPath([...(parsed.ok ? [] : parsed.problems), ...scenarioProblems]);
}

export function swingsErrors(s: Scenario, d: SwingsDraft): FieldErrors {
  const parsed = check(swingSettingsSchema, swingsFromDraft(d));
  return byPath(parsed.ok ? checkSwingSettings(s, parsed.value) : parsed.problems);
}

export function breakevenErrors(d: BreakevenDraft): FieldErrors {
  const parsed = check(breakevenPriceSettingsSchema, breakevenFromDraft(d));
  return byPath(parsed.ok ? [] : parsed.problems);
}

export function uncertaintyErrors(s: Scenario, d: UncertaintyDraft): FieldErrors {
  const parsed = check(uncertaintySettingsSchema, uncertaintyFromDraft(d));
  return byPath(parsed.ok ? checkUncertaintySettings(s, parsed.value) : parsed.problems);
}
