import type { Scenario } from '../../contracts/scenario';
import { compileFast } from '../fast-path';
import type { FastScenario } from '../fast-path';
import type { UncertaintyPlan } from './uncertainty';

const PRICE_PATH = 'electricity.pricePerKwh';

/**
 * How a drawn input reaches the fast path. The price is fastPresentValue's price argument. An
 * option's photonEfficacy or ppf, and utilization, scale the photons each fixture puts on the canopy
 * (Φ × U × M), which is exactly what fastPresentValue's efficacy factor multiplies, so they become
 * a factor of drawn / entered value. Every other input is written into the scenario, which is
 * compiled again (see compileDraw).
 */
export type DrawRoute =
  | { kind: 'price' }
  | { kind: 'factor'; option: number; entered: number }
  | { kind: 'factor-all'; entered: number }
  | { kind: 'field' };

/** The route of the input at a field path of the scenario. */
export function routeOf(s: Scenario, path: string): DrawRoute {
  if (path === PRICE_PATH) return { kind: 'price' };
  if (path === 'utilization') return { kind: 'factor-all', entered: s.utilization };
  const m = /^options\[(\d+)\]\.(photonEfficacy|ppf)$/.exec(path);
  const o = m ? s.options[Number(m[1])] : undefined;
  const entered = m && o ? (m[2] === 'ppf' ? o.ppf : o.photonEfficacy) : undefined;
  return m && entered !== undefined ? { kind: 'factor', option: Number(m[1]), entered } : { kind: 'field' };
}

/**
 * The fast path for one drawn scenario, through compileFast only: it compiles the drawn scenario
 * restricted to the options a drawn input touches and keeps the other options as compiled from the
 * scenario as entered. A compiled option depends only on its own fields, utilization, leveling
 * basis, lit hours and horizon, so the ones kept are exactly what a full compile would give.
 */
export function compileDraw(plan: Pick<UncertaintyPlan, 'baseFast' | 'scenarioDrawn' | 'optionsDrawn'>, drawn: Scenario): FastScenario {
  const { baseFast, scenarioDrawn, optionsDrawn } = plan;
  if (!scenarioDrawn && optionsDrawn.length === 0) return baseFast;
  if (optionsDrawn.length === baseFast.options.length) return compileFast(drawn);
  const part = compileFast({ ...drawn, options: optionsDrawn.map((i) => drawn.options[i]!) });
  const options = baseFast.options.slice();
  optionsDrawn.forEach((i, k) => {
    options[i] = part.options[k]!;
  });
  return { ...(scenarioDrawn ? part : baseFast), options };
}
