import type { Scenario } from '../../contracts/scenario';
import { MAX_PHOTON_EFFICACY } from '../../contracts/scenario';
import type { Decimal } from '../money';
import type { EfficacyBreakeven } from './breakeven';
import { optionIndexOf } from './checks';
import { ledgerPresentValues, withPrice } from './ledger-values';

/**
 * Present value of option a minus that of option b through the decimal ledger, at the scenario's
 * electricity price or at another year-1 price.
 * @param pricePerKwh year-1 price as decimal text, per kWh; the scenario's own when omitted
 * @returns PV(a) − PV(b), currency (negative when a costs less)
 */
export function presentValueGap(s: Scenario, a: string, b: string, pricePerKwh?: string): Decimal {
  const ia = optionIndexOf(s, a);
  const ib = optionIndexOf(s, b);
  if (ia < 0 || ib < 0) throw new RangeError(`no option "${ia < 0 ? a : b}"`);
  const pv = ledgerPresentValues(pricePerKwh === undefined ? s : withPrice(s, pricePerKwh));
  return pv[ia]!.minus(pv[ib]!);
}

/** What an efficacy break-even means in µmol/J and in per cent of the efficacy as entered. */
export interface EfficacyBreakevenFigures {
  /** efficacy at the top of the range searched, µmol/J */
  topEfficacy: number;
  /** true when the top of the range searched is the physical limit (MAX_PHOTON_EFFICACY µmol/J) */
  topIsPhysicalLimit: boolean;
  /** efficacy at the break-even multiplier, µmol/J; null when there is none */
  breakevenEfficacy: number | null;
  /** change in efficacy the break-even asks for, % of the efficacy as entered: negative when the option could lose that much; null when there is none */
  changePct: number | null;
}

/**
 * An efficacy break-even in the units a reader compares: efficacy × multiplier (µmol/J) and the
 * change (multiplier − 1) × 100 (%).
 * @param e the break-even multiplier found by breakevenEfficacy
 * @param efficacy the varied option's photon efficacy as entered, µmol/J
 */
export function efficacyBreakevenFigures(e: EfficacyBreakeven, efficacy: number): EfficacyBreakevenFigures {
  const topEfficacy = efficacy * e.searched[1];
  return {
    topEfficacy,
    topIsPhysicalLimit: topEfficacy >= MAX_PHOTON_EFFICACY - 1e-9,
    breakevenEfficacy: e.factor === null ? null : efficacy * e.factor,
    changePct: e.factor === null ? null : 100 * (e.factor - 1),
  };
}
