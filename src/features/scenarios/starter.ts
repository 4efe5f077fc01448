import { SCENARIO_FORMAT } from '../../contracts/scenario';
import type { ScenarioInput } from '../../contracts/scenario';

/**
 * The document a new scenario starts from: one room, one growth phase and one option whose figures
 * are there to be replaced. Everything is plain placeholder values, not data about any product.
 */
export function starterScenario(title: string, currency: string): ScenarioInput {
  return {
    format: SCENARIO_FORMAT,
    title,
    currency,
    canopy: { lengthM: 4, widthM: 3 },
    target: { ppfd: 600 },
    schedule: [{ label: 'flower', hoursPerDay: 12, daysPerYear: 300 }],
    utilization: 1,
    levelAt: 'initial',
    fixtureCount: 'exact',
    horizonYears: 5,
    discountRatePct: 0,
    electricity: { pricePerKwh: '0.20', escalationPctPerYear: 0, demandChargePerKwMonth: '0' },
    baseline: 'option-a',
    options: [
      { id: 'option-a', label: 'Option A (replace with real figures)', technology: 'other', wallWatts: 100, photonEfficacy: 1, fixturePrice: '0' },
    ],
  };
}
