import type { Option, Scenario } from '../contracts/scenario';
import { canopyArea, fixtureFlux, level, litHoursPerYear, outputFactor, targetPpfd } from './leveling';
import { replacementsByYear } from './relamping';
import { as } from './units';
import type { Fraction, Hours, MicromolePerSecond, Ppfd, SquareMetres } from './units';

/** Figures shared by every option of a scenario. */
export interface ScenarioBasis {
  /** m² */
  area: SquareMetres;
  /** µmol m⁻² s⁻¹ */
  target: Ppfd;
  /** h per year */
  hours: Hours;
  /** whole years */
  horizon: number;
}

/**
 * The physical side of one option once leveled: plain numbers that the decimal ledger and the
 * float fast path both price, so the two can only differ in arithmetic, never in formula.
 */
export interface OptionPlan {
  id: string;
  fixturesExact: number;
  fixturesWhole: number;
  /** count that recurring costs follow */
  fixturesUsed: number;
  /** count bought at year 0: 0 when owned */
  fixturesBought: number;
  /** µmol m⁻² s⁻¹ */
  achievedPpfd: number;
  /** kWh per year */
  energyKwhPerYear: number;
  /** kWh per year */
  coolingKwhPerYear: number;
  /** h per year, as in the basis */
  litHoursPerYear: number;
  /** kW of lighting load that demand charges apply to */
  demandKw: number;
  /** lamp sets replaced per fixture, indexed by year 0..N */
  replacementsPerFixture: number[];
}

/** Area, target, lit hours and horizon of a validated scenario. */
export function scenarioBasis(s: Scenario): ScenarioBasis {
  return { area: canopyArea(s), target: targetPpfd(s), hours: litHoursPerYear(s), horizon: s.horizonYears };
}

/**
 * Levels one option and works out its yearly energy, cooling energy, demand and relamping.
 * @param efficacyFactor multiplier on the option's photon output (1 = as entered), used by sweeps
 */
export function planOption(s: Scenario, basis: ScenarioBasis, o: Option, efficacyFactor = 1): OptionPlan {
  const flux = as<MicromolePerSecond>(fixtureFlux(o) * efficacyFactor);
  const lv = level(basis.target, basis.area, flux, as<Fraction>(s.utilization), outputFactor(o, s.levelAt), s.fixtureCount);
  const bought = o.owned ? 0 : s.fixtureCount === 'whole' ? lv.whole : lv.exact;
  const energy = (lv.used * o.wallWatts * basis.hours) / 1000;
  const cooling = s.cooling ? (energy * s.cooling.share) / s.cooling.cop : 0;
  return {
    id: o.id,
    fixturesExact: lv.exact,
    fixturesWhole: lv.whole,
    fixturesUsed: lv.used,
    fixturesBought: bought,
    achievedPpfd: lv.achievedPpfd,
    energyKwhPerYear: energy,
    coolingKwhPerYear: cooling,
    litHoursPerYear: basis.hours,
    demandKw: (lv.used * o.wallWatts) / 1000,
    replacementsPerFixture: o.lamp
      ? replacementsByYear(basis.hours, basis.horizon, o.lamp.replaceEveryHours)
      : new Array<number>(basis.horizon + 1).fill(0),
  };
}
