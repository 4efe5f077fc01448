import type { Scenario } from '../../../contracts/scenario';
import { compileFast, fastPresentValue } from '../../../engine/fast-path';
import { fixtureFlux } from '../../../engine/leveling';
import { breakevenEfficacy, breakevenPrice } from '../../../engine/sensitivity/breakeven';
import type { EfficacyBreakeven, PriceBreakeven } from '../../../engine/sensitivity/breakeven';
import { optionIndexOf } from '../../../engine/sensitivity/checks';

/** Break-even figures for one pair of options, with what a reader needs to put them in sentences. */
export interface BreakevenReport {
  a: string;
  b: string;
  price: PriceBreakeven;
  /** year-1 price of the scenario, per kWh */
  currentPrice: number;
  /** PV(a) − PV(b) at the scenario's price and at a price of 0, currency (fast path) */
  gapNow: number;
  gapAtZero: number;
  /** the multiplier on a's efficacy that makes a no dearer than b, and the other way round */
  aAgainstB: EfficacyBreakeven;
  bAgainstA: EfficacyBreakeven;
  /** photon efficacy as entered (PPF over wall watts), µmol/J */
  efficacyA: number;
  efficacyB: number;
}

/** The three steps of a break-even report, so a runner can report progress between them. */
export function breakevenSteps(s: Scenario, a: string, b: string): { steps: Array<() => void>; report: () => BreakevenReport } {
  let price: PriceBreakeven | undefined;
  let aAgainstB: EfficacyBreakeven | undefined;
  let bAgainstA: EfficacyBreakeven | undefined;
  const steps = [
    () => {
      price = breakevenPrice(s, { a, b });
    },
    () => {
      aAgainstB = breakevenEfficacy(s, { vary: a, against: b, lo: 0.1, hi: 10 });
    },
    () => {
      bAgainstA = breakevenEfficacy(s, { vary: b, against: a, lo: 0.1, hi: 10 });
    },
  ];
  const report = (): BreakevenReport => {
    if (!price || !aAgainstB || !bAgainstA) throw new Error('the break-even steps have not all run');
    const fast = compileFast(s);
    const ia = optionIndexOf(s, a);
    const ib = optionIndexOf(s, b);
    const gap = (p: number) => fastPresentValue(fast, ia, p) - fastPresentValue(fast, ib, p);
    const oa = s.options[ia]!;
    const ob = s.options[ib]!;
    return {
      a,
      b,
      price,
      currentPrice: fast.pricePerKwh,
      gapNow: gap(fast.pricePerKwh),
      gapAtZero: gap(0),
      aAgainstB,
      bAgainstA,
      efficacyA: fixtureFlux(oa) / oa.wallWatts,
      efficacyB: fixtureFlux(ob) / ob.wallWatts,
    };
  };
  return { steps, report };
}
