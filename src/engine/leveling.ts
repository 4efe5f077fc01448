import type { Option, Scenario } from '../contracts/scenario';
import { as } from './units';
import type { Dli, Fraction, Hours, MicromolePerSecond, Ppfd, SquareMetres } from './units';

/** Tolerance applied before rounding a fixture count up, so 17.000000000000004 stays 17. */
export const WHOLE_TOLERANCE = 1e-9;

/**
 * Target PPFD that a DLI needs over one photoperiod: T = DLI × 10⁶ / (3600 × hoursPerDay).
 * @param dli mol m⁻² d⁻¹
 * @param hoursPerDay lit hours per day, h
 * @returns µmol m⁻² s⁻¹
 */
export function ppfdFromDli(dli: Dli, hoursPerDay: Hours): Ppfd {
  return as<Ppfd>((dli * 1e6) / (3600 * hoursPerDay));
}

/**
 * Daily light integral of a constant PPFD over a photoperiod: DLI = PPFD × hours × 3600 / 10⁶.
 * @param ppfd µmol m⁻² s⁻¹
 * @param hoursPerDay h
 * @returns mol m⁻² d⁻¹
 */
export function dliFromPpfd(ppfd: Ppfd, hoursPerDay: Hours): Dli {
  return as<Dli>((ppfd * hoursPerDay * 3600) / 1e6);
}

/** Lit canopy area, m² = lengthM × widthM (both in m). */
export function canopyArea(s: { canopy: { lengthM: number; widthM: number } }): SquareMetres {
  return as<SquareMetres>(s.canopy.lengthM * s.canopy.widthM);
}

/** Lit hours per year, h = Σ hoursPerDay (h) × daysPerYear (d) over the growth phases. */
export function litHoursPerYear(s: { schedule: readonly { hoursPerDay: number; daysPerYear: number }[] }): Hours {
  return as<Hours>(s.schedule.reduce((sum, row) => sum + row.hoursPerDay * row.daysPerYear, 0));
}

/** The scenario's target as PPFD, µmol m⁻² s⁻¹; a DLI target is spread over the single phase's photoperiod. */
export function targetPpfd(s: Pick<Scenario, 'target' | 'schedule'>): Ppfd {
  if (s.target.ppfd !== undefined) return as<Ppfd>(s.target.ppfd);
  const row = s.schedule[0];
  if (s.target.dli === undefined || row === undefined) throw new Error('target needs ppfd, or dli with one schedule row');
  return ppfdFromDli(as<Dli>(s.target.dli), as<Hours>(row.hoursPerDay));
}

/** Photon flux of one fixture, µmol/s: photonEfficacy × wallWatts, or the ppf given. */
export function fixtureFlux(o: Pick<Option, 'photonEfficacy' | 'ppf' | 'wallWatts'>): MicromolePerSecond {
  if (o.ppf !== undefined) return as<MicromolePerSecond>(o.ppf);
  return as<MicromolePerSecond>((o.photonEfficacy ?? 0) * o.wallWatts);
}

/**
 * Output factor M used for leveling: 1 at "initial"; at "maintained", the lamp's output just before
 * relamping, or for lampless fixtures the output at the horizon's end (both as fractions of initial).
 */
export function outputFactor(o: Pick<Option, 'lamp' | 'outputAtHorizonPct'>, levelAt: Scenario['levelAt']): Fraction {
  if (levelAt === 'initial') return as<Fraction>(1);
  return as<Fraction>((o.lamp ? o.lamp.outputAtReplacementPct : o.outputAtHorizonPct) / 100);
}

/** Fixture counts that put the target on the canopy: exact (fractional) and whole (rounded up). */
export interface Leveling {
  /** n = T × A / (Φ × U × M), fixtures */
  exact: number;
  /** ⌈n⌉ after a 1e-9 tolerance, fixtures */
  whole: number;
  /** the count that costs follow: exact or whole, per the scenario's fixtureCount */
  used: number;
  /** used × Φ × U × M / A, µmol m⁻² s⁻¹ */
  achievedPpfd: Ppfd;
}

/**
 * Levels one option to the target PPFD over the canopy.
 * @param target µmol m⁻² s⁻¹
 * @param area m²
 * @param flux photon flux of one fixture, µmol/s
 * @param utilization share of photons reaching the canopy, (0, 1]
 * @param factor output factor M, (0, 1]
 * @param count which count the costs follow
 */
export function level(
  target: Ppfd,
  area: SquareMetres,
  flux: MicromolePerSecond,
  utilization: Fraction,
  factor: Fraction,
  count: Scenario['fixtureCount'],
): Leveling {
  const perFixture = flux * utilization * factor;
  const exact = (target * area) / perFixture;
  const whole = Math.ceil(exact - WHOLE_TOLERANCE);
  const used = count === 'whole' ? whole : exact;
  const achievedPpfd = as<Ppfd>(count === 'whole' ? (used * perFixture) / area : target);
  return { exact, whole, used, achievedPpfd };
}
