import type { Scenario } from '../contracts/scenario';
import { scenarioHash } from './canonical';
import { discountFactors, energyPrices, priceLedger } from './ledger';
import type { DecimalLedger } from './ledger';
import { Decimal, moneyText } from './money';
import { paybackYears } from './payback';
import { planOption, scenarioBasis } from './plan';
import type { OptionPlan } from './plan';
import { RESULT_FORMAT } from './result-types';
import type { OptionResult, ScenarioResult } from './result-types';
import { ENGINE_VERSION } from './version';

/**
 * Computes a validated scenario: levels every option to the target over the canopy, prices each
 * one's yearly ledger in decimals, and reports totals, present values, cost per mol, payback
 * against the baseline and the cheapest option (`photon-parity/result@1`).
 */
export function computeScenario(s: Scenario): ScenarioResult {
  const basis = scenarioBasis(s);
  const prices = energyPrices(s);
  const discounts = discountFactors(s);
  const priced = s.options.map((o) => {
    const plan = planOption(s, basis, o);
    return { plan, ledger: priceLedger(s, o, plan, prices, discounts) };
  });
  const baseline = priced.find((p) => p.plan.id === s.baseline);
  const baselineCumulative = baseline?.ledger.years.map((y) => y.cumulative) ?? [];
  // Photons delivered over the horizon per µmol m⁻² s⁻¹ of achieved PPFD, in mol.
  const molPerPpfd = (basis.area * basis.hours * 3600 * basis.horizon) / 1e6;

  const options = priced.map(({ plan, ledger }): OptionResult => {
    const payback = plan.id === s.baseline ? null : paybackYears(ledger.years.map((y) => y.cumulative), baselineCumulative);
    return optionResult(plan, ledger, payback, molPerPpfd);
  });

  let cheapest = priced[0];
  for (const p of priced) if (cheapest && p.ledger.totalPresentValue.lt(cheapest.ledger.totalPresentValue)) cheapest = p;

  return {
    format: RESULT_FORMAT,
    engineVersion: ENGINE_VERSION,
    inputHash: scenarioHash(s),
    canopyAreaM2: basis.area,
    targetPpfd: basis.target,
    litHoursPerYear: basis.hours,
    cheapest: cheapest?.plan.id ?? '',
    options,
  };
}

function optionResult(plan: OptionPlan, ledger: DecimalLedger, payback: number | null, molPerPpfd: number): OptionResult {
  const mol = new Decimal(plan.achievedPpfd).times(molPerPpfd);
  return {
    id: plan.id,
    fixturesExact: plan.fixturesExact,
    fixturesWhole: plan.fixturesWhole,
    fixturesUsed: plan.fixturesUsed,
    achievedPpfd: plan.achievedPpfd,
    energyKwhPerYear: plan.energyKwhPerYear,
    coolingKwhPerYear: plan.coolingKwhPerYear,
    capex: moneyText(ledger.capex),
    energyCost: moneyText(ledger.energyCost),
    coolingCost: moneyText(ledger.coolingCost),
    demandCost: moneyText(ledger.demandCost),
    lampCost: moneyText(ledger.lampCost),
    totalNominal: moneyText(ledger.totalNominal),
    totalPresentValue: moneyText(ledger.totalPresentValue),
    costPerMol: moneyText(ledger.totalPresentValue.div(mol)),
    paybackYears: payback,
    years: ledger.years.map((y) => ({
      year: y.year,
      capex: moneyText(y.capex),
      energy: moneyText(y.energy),
      cooling: moneyText(y.cooling),
      demand: moneyText(y.demand),
      lamps: moneyText(y.lamps),
      total: moneyText(y.total),
      cumulative: moneyText(y.cumulative),
    })),
  };
}
