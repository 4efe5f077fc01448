import type { Scenario } from '../../../contracts/scenario';
import { photonEfficacyOf } from '../../../engine/entry-conversions';
import { breakevenEfficacy, breakevenPrice } from '../../../engine/sensitivity/breakeven';
import type { EfficacyBreakeven, PriceBreakeven } from '../../../engine/sensitivity/breakeven';
import { presentValueGap } from '../../../engine/sensitivity/breakeven-figures';
import { optionIndexOf } from '../../../engine/sensitivity/checks';

/** Break-even figures for one pair of options, with what a reader needs to put them in sentences. */
export interface BreakevenReport {
  a: string;
  b: string;
  price: PriceBreakeven;
  /** year-1 price of the scenario, per kWh */
  currentPrice: number;
  /** PV(a) − PV(b) at the scenario's price and at a price of 0, currency as decimal text (decimal ledger) */
  gapNow: string;
  gapAtZero: string;
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
    const oa = s.options[optionIndexOf(s, a)]!;
    const ob = s.options[optionIndexOf(s, b)]!;
    return {
      a,
      b,
      price,
      currentPrice: Number(s.electricity.pricePerKwh),
      gapNow: presentValueGap(s, a, b).toString(),
      gapAtZero: presentValueGap(s, a, b, '0').toString(),
      aAgainstB,
      bAgainstA,
      // A parsed option has exactly one of photonEfficacy and ppf, and wallWatts > 0, so neither is null.
      efficacyA: photonEfficacyOf(oa)!,
      efficacyB: photonEfficacyOf(ob)!,
    };
  };
  return { steps, report };
}
