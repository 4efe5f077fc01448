import type { Option, Scenario } from '../contracts/scenario';
import { ZERO, dec } from './money';
import type { Decimal } from './money';
import type { OptionPlan } from './plan';

/** One year of an option's cash flows, in decimals. */
export interface DecimalYear {
  year: number;
  capex: Decimal;
  energy: Decimal;
  cooling: Decimal;
  demand: Decimal;
  lamps: Decimal;
  total: Decimal;
  cumulative: Decimal;
}

/** An option's ledger with its sums, all in decimals. */
export interface DecimalLedger {
  years: DecimalYear[];
  capex: Decimal;
  energyCost: Decimal;
  coolingCost: Decimal;
  demandCost: Decimal;
  lampCost: Decimal;
  totalNominal: Decimal;
  totalPresentValue: Decimal;
}

/**
 * Electricity price in each year t = 1..N: pricePerKwh × (1 + escalation)^(t−1), per kWh.
 * Index 0 is unused (0) so that prices[t] reads as year t.
 */
export function energyPrices(s: Scenario): Decimal[] {
  const growth = dec(1).plus(dec(s.electricity.escalationPctPerYear).div(100));
  const base = dec(s.electricity.pricePerKwh);
  const prices: Decimal[] = [ZERO];
  for (let t = 1; t <= s.horizonYears; t++) prices.push(base.times(growth.pow(t - 1)));
  return prices;
}

/**
 * Discount factors 1 / (1 + d)^t for t = 0..N, d the real discount rate (NIST Handbook 135's
 * end-of-year single present value factor).
 */
export function discountFactors(s: Scenario): Decimal[] {
  const base = dec(1).plus(dec(s.discountRatePct).div(100));
  const factors: Decimal[] = [];
  for (let t = 0; t <= s.horizonYears; t++) factors.push(dec(1).div(base.pow(t)));
  return factors;
}

/**
 * Prices an option's plan year by year in decimal arithmetic: capital at year 0; energy, cooling,
 * demand charges and relamping at the end of years 1..N; then nominal and present-value totals.
 * @param prices from energyPrices, per kWh by year
 * @param discounts from discountFactors, by year
 */
export function priceLedger(s: Scenario, o: Option, plan: OptionPlan, prices: Decimal[], discounts: Decimal[]): DecimalLedger {
  const used = dec(plan.fixturesUsed);
  const unitCapex = dec(o.fixturePrice ?? 0).plus(o.installPrice).minus(o.rebate);
  const capex = dec(plan.fixturesBought).times(unitCapex);
  // Energy is recomputed from its factors in decimals so that money never inherits float noise.
  const kw = used.times(o.wallWatts).div(1000);
  const energyKwh = kw.times(plan.litHoursPerYear);
  const coolingKwh = s.cooling ? energyKwh.times(s.cooling.share).div(s.cooling.cop) : ZERO;
  const demand = kw.times(s.electricity.demandChargePerKwMonth).times(12);
  const lampSet = o.lamp ? used.times(o.lamp.price) : ZERO;

  const years: DecimalYear[] = [
    { year: 0, capex, energy: ZERO, cooling: ZERO, demand: ZERO, lamps: ZERO, total: capex, cumulative: capex },
  ];
  let cumulative = capex;
  let pv = capex.times(discounts[0] ?? 1);
  let energyCost = ZERO;
  let coolingCost = ZERO;
  let demandCost = ZERO;
  let lampCost = ZERO;
  for (let t = 1; t <= s.horizonYears; t++) {
    const price = prices[t] ?? ZERO;
    const energy = energyKwh.times(price);
    const cooling = coolingKwh.times(price);
    const lamps = lampSet.times(plan.replacementsPerFixture[t] ?? 0);
    const total = energy.plus(cooling).plus(demand).plus(lamps);
    cumulative = cumulative.plus(total);
    pv = pv.plus(total.times(discounts[t] ?? ZERO));
    energyCost = energyCost.plus(energy);
    coolingCost = coolingCost.plus(cooling);
    demandCost = demandCost.plus(demand);
    lampCost = lampCost.plus(lamps);
    years.push({ year: t, capex: ZERO, energy, cooling, demand, lamps, total, cumulative });
  }
  return { years, capex, energyCost, coolingCost, demandCost, lampCost, totalNominal: cumulative, totalPresentValue: pv };
}
