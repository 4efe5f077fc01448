import type { Scenario } from '../../contracts/scenario';
import { discountFactors, energyPrices, priceLedger } from '../ledger';
import type { Decimal } from '../money';
import { planOption, scenarioBasis } from '../plan';

/**
 * Present value of every option through the decimal ledger (the same plan and ledger that
 * computeScenario prices), in scenario order.
 * @param efficacy optional multiplier on one option's photon output (1 = as entered)
 * @returns present values in the scenario's currency
 */
export function ledgerPresentValues(s: Scenario, efficacy?: { index: number; factor: number }): Decimal[] {
  const basis = scenarioBasis(s);
  const prices = energyPrices(s);
  const discounts = discountFactors(s);
  return s.options.map((o, i) => {
    const factor = efficacy && efficacy.index === i ? efficacy.factor : 1;
    const plan = planOption(s, basis, o, factor);
    return priceLedger(s, o, plan, prices, discounts).totalPresentValue;
  });
}

/** A copy of the scenario with another year-1 electricity price (decimal text, per kWh). */
export function withPrice(s: Scenario, pricePerKwh: string): Scenario {
  return { ...s, electricity: { ...s.electricity, pricePerKwh } };
}
