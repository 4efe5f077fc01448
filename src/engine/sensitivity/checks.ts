import type { Problem } from '../../contracts/problems';
import type { Scenario } from '../../contracts/scenario';
import { MAX_PHOTON_EFFICACY } from '../../contracts/scenario';
import type { UncertaintySettings } from '../../contracts/sensitivity';
import { fixtureFlux } from '../leveling';
import { numericInputs, withinBounds } from './inputs';

/** Position of an option in the scenario, or −1. */
export function optionIndexOf(s: Scenario, id: string): number {
  return s.options.findIndex((o) => o.id === id);
}

/** A Problem when `id` names no option of the scenario, else none. */
export function checkOptionId(s: Scenario, id: string, path: string): Problem[] {
  return optionIndexOf(s, id) >= 0 ? [] : [{ path, message: `names no option of this scenario (ids: ${s.options.map((o) => o.id).join(', ')})` }];
}

/**
 * Highest efficacy multiplier an option can take before its photon efficacy passes the physical
 * limit for 400–700 nm (MAX_PHOTON_EFFICACY µmol/J).
 */
export function maxEfficacyFactor(s: Scenario, index: number): number {
  const o = s.options[index];
  if (!o) return 0;
  return MAX_PHOTON_EFFICACY / (fixtureFlux(o) / o.wallWatts);
}

/**
 * Problems of sweep settings that only the scenario can reveal: an unknown option, or a multiplier
 * that would lift the option's efficacy above the physical limit. Either part may be absent, so a
 * caller can report these alongside problems in the other settings.
 */
export function checkSweepSettings(s: Scenario, settings: { vary?: string | undefined; efficacy?: { hi: number } | undefined }): Problem[] {
  if (settings.vary === undefined) return [];
  const problems = checkOptionId(s, settings.vary, 'vary');
  const index = optionIndexOf(s, settings.vary);
  if (index >= 0 && settings.efficacy) {
    const limit = maxEfficacyFactor(s, index);
    if (settings.efficacy.hi > limit * (1 + 1e-12)) {
      problems.push({
        path: 'efficacy.hi',
        message: `must be at most ${limit.toPrecision(4)}: a higher multiplier puts "${settings.vary}" above ${MAX_PHOTON_EFFICACY} µmol/J, the physical limit for 400–700 nm`,
      });
    }
  }
  return problems;
}

/**
 * Problems of uncertainty settings against a scenario: every path must be a numeric input that
 * enters the costs (horizonYears is a whole number and is not drawn), and low and high must stay
 * in the range the scenario schema allows, so that every draw is a valid scenario. Two rules tie
 * fields together: the phases' days stay within 366, and ppf / wallWatts stays within the limit.
 */
export function checkUncertaintySettings(s: Scenario, settings: UncertaintySettings): Problem[] {
  const catalogue = new Map(numericInputs(s).map((i) => [i.path, i]));
  const problems: Problem[] = [];
  const drawn = new Map(settings.inputs.map((r) => [r.path, r]));
  settings.inputs.forEach((r, i) => {
    const input = catalogue.get(r.path);
    if (!input) {
      problems.push({ path: `inputs[${i}].path`, message: `"${r.path}" is not a numeric input of this scenario that enters the costs` });
      return;
    }
    if (input.bounds.integer) {
      problems.push({ path: `inputs[${i}].path`, message: `"${r.path}" is a whole number and cannot be drawn; compare horizons as separate scenarios` });
      return;
    }
    const b = input.bounds;
    const rangeText = `${b.minInclusive ? 'at least' : 'greater than'} ${b.min} and at most ${b.max} ${input.unit}`.trim();
    if (!withinBounds(r.low, b)) problems.push({ path: `inputs[${i}].low`, message: `must be ${rangeText}` });
    if (!withinBounds(r.high, b)) problems.push({ path: `inputs[${i}].high`, message: `must be ${rangeText}` });
  });
  const days = s.schedule.reduce((sum, row, i) => sum + (drawn.get(`schedule[${i}].daysPerYear`)?.high ?? row.daysPerYear), 0);
  if (days > 366) problems.push({ path: 'inputs', message: `the phases' days can add up to ${days}; a year has at most 366` });
  s.options.forEach((o, i) => {
    const ppf = drawn.get(`options[${i}].ppf`)?.high ?? o.ppf;
    const watts = drawn.get(`options[${i}].wallWatts`)?.low ?? o.wallWatts;
    if (ppf !== undefined && ppf / watts > MAX_PHOTON_EFFICACY) {
      problems.push({ path: 'inputs', message: `options[${i}]: high ppf over low wallWatts exceeds ${MAX_PHOTON_EFFICACY} µmol/J, the physical limit` });
    }
  });
  return problems;
}
