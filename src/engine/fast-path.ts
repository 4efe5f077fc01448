import type { Scenario } from '../contracts/scenario';
import { WHOLE_TOLERANCE, canopyArea, fixtureFlux, litHoursPerYear, outputFactor, targetPpfd } from './leveling';
import { replacementsByYear } from './relamping';

/** One option reduced to the plain numbers the fast path prices. */
export interface FastOption {
  id: string;
  /** µmol/s that reach the canopy from one fixture at efficacy factor 1: Φ × U × M */
  canopyFluxPerFixture: number;
  /** W */
  wallWatts: number;
  owned: boolean;
  /** fixture + install − rebate, per fixture */
  unitCapex: number;
  /** lamp set price per fixture, 0 without a lamp */
  lampPrice: number;
  /** replacements per fixture by year 0..N */
  replacements: Float64Array;
}

/**
 * A scenario compiled for many evaluations in plain floating point: the same cash flows as the
 * decimal ledger (same leveling, same years, same discounting), for sweeps and uncertainty runs.
 */
export interface FastScenario {
  /** µmol m⁻² s⁻¹ × m², the photon flux the canopy needs, µmol/s */
  neededFlux: number;
  /** m² */
  area: number;
  /** h per year */
  hours: number;
  horizon: number;
  whole: boolean;
  /** 1 + share / cop: kWh drawn per kWh of lighting once cooling is counted */
  energyWithCooling: number;
  /** demand charge per kW-month × 12 */
  demandPerKwYear: number;
  /** (1 + escalation)^(t−1) for t = 1..N (index 0 unused) */
  priceGrowth: Float64Array;
  /** 1 / (1 + d)^t for t = 0..N */
  discount: Float64Array;
  /** per kWh as entered */
  pricePerKwh: number;
  options: FastOption[];
}

/** Compiles a validated scenario for the fast path. */
export function compileFast(s: Scenario): FastScenario {
  const area = canopyArea(s);
  const hours = litHoursPerYear(s);
  const n = s.horizonYears;
  const growth = 1 + s.electricity.escalationPctPerYear / 100;
  const rate = 1 + s.discountRatePct / 100;
  const priceGrowth = new Float64Array(n + 1);
  const discount = new Float64Array(n + 1);
  // Repeated multiplication and division rather than `**`: both are correctly rounded IEEE 754
  // operations, so the factors (and every seeded uncertainty run) are the same in every JS engine.
  discount[0] = 1;
  let compound = 1;
  let grown = 1;
  for (let t = 1; t <= n; t++) {
    compound *= rate;
    discount[t] = 1 / compound;
    priceGrowth[t] = grown;
    grown *= growth;
  }
  return {
    neededFlux: targetPpfd(s) * area,
    area,
    hours,
    horizon: n,
    whole: s.fixtureCount === 'whole',
    energyWithCooling: 1 + (s.cooling ? s.cooling.share / s.cooling.cop : 0),
    demandPerKwYear: Number(s.electricity.demandChargePerKwMonth) * 12,
    priceGrowth,
    discount,
    pricePerKwh: Number(s.electricity.pricePerKwh),
    options: s.options.map((o) => ({
      id: o.id,
      canopyFluxPerFixture: fixtureFlux(o) * s.utilization * outputFactor(o, s.levelAt),
      wallWatts: o.wallWatts,
      owned: o.owned,
      unitCapex: Number(o.fixturePrice ?? 0) + Number(o.installPrice) - Number(o.rebate),
      lampPrice: o.lamp ? Number(o.lamp.price) : 0,
      replacements: Float64Array.from(o.lamp ? replacementsByYear(hours, n, o.lamp.replaceEveryHours) : new Array<number>(n + 1).fill(0)),
    })),
  };
}

/**
 * Present value of one option on the fast path.
 * @param optionIndex position of the option in the scenario
 * @param pricePerKwh electricity price in year 1, per kWh
 * @param efficacyFactor multiplier on the option's photon output (1 = as entered)
 * @returns present value in the scenario's currency, as a float
 */
export function fastPresentValue(fs: FastScenario, optionIndex: number, pricePerKwh: number, efficacyFactor = 1): number {
  const o = fs.options[optionIndex];
  if (!o) throw new RangeError(`no option at index ${optionIndex}`);
  const exact = fs.neededFlux / (o.canopyFluxPerFixture * efficacyFactor);
  const used = fs.whole ? Math.ceil(exact - WHOLE_TOLERANCE) : exact;
  const kw = (used * o.wallWatts) / 1000;
  const kwhPerYear = kw * fs.hours * fs.energyWithCooling;
  const demand = kw * fs.demandPerKwYear;
  const lampSet = used * o.lampPrice;
  let pv = o.owned ? 0 : used * o.unitCapex;
  for (let t = 1; t <= fs.horizon; t++) {
    const cost = kwhPerYear * pricePerKwh * fs.priceGrowth[t]! + demand + lampSet * o.replacements[t]!;
    pv += cost * fs.discount[t]!;
  }
  return pv;
}
