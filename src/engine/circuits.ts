/**
 * Branch-circuit planning for lighting loads. Lighting that runs three hours or more at a time is
 * a continuous load; NFPA 70 (National Electrical Code) 210.19(A)(1) and 210.20(A) size the branch
 * conductors and the overcurrent device for 125 % of it, which is the same as loading a circuit to
 * at most 80 % of the breaker's rating. Figures here are planning aids: circuits are designed and
 * installed by a licensed electrician under the local code, which may differ.
 */

/** Share of the breaker rating a continuous load may use (1 / 1.25), NEC 210.19(A)(1) and 210.20(A). */
export const CONTINUOUS_LOAD_SHARE = 0.8;

/** Floating-point slack so that, e.g., 16 A / 4 A counts as 4 fixtures, not 3. */
const COUNT_TOLERANCE = 1e-9;

/** What a circuit plan needs to know about the supply and one fixture. */
export interface CircuitInput {
  /** input power of one fixture at the wall, W */
  wallWatts: number;
  /** circuit voltage, V (RMS) */
  volts: number;
  /** breaker (overcurrent device) rating, A */
  breakerAmps: number;
  /** power factor of the fixture's ballast or driver, (0, 1] */
  powerFactor: number;
}

/** A branch-circuit plan for a room of identical fixtures. */
export interface CircuitPlan {
  /** current of one fixture, A = W / (V × PF) */
  fixtureAmps: number;
  /** most current a continuous load may draw on one circuit, A = 0.8 × breaker rating */
  continuousLimitAmps: number;
  /** whole fixtures one circuit carries within the continuous limit; 0 when one fixture alone exceeds it */
  fixturesPerCircuit: number;
  /** whole fixtures the room needs (the leveled count rounded up) */
  fixtures: number;
  /** branch circuits the room needs; null when a single fixture exceeds one circuit's continuous limit */
  circuits: number | null;
  /** current on the most loaded circuit, A; null when circuits is null */
  heaviestCircuitAmps: number | null;
  /** heat the lighting gives off into the room with every whole fixture on, W */
  heatWatts: number;
}

/**
 * Current drawn by one fixture: I = P / (V × PF).
 * @param wallWatts W at the wall
 * @param volts V (RMS)
 * @param powerFactor ratio of real to apparent power, (0, 1]
 * @returns A
 */
export function fixtureCurrent(wallWatts: number, volts: number, powerFactor: number): number {
  return wallWatts / (volts * powerFactor);
}

/**
 * Most current a continuous load may draw on a circuit: 80 % of the breaker rating
 * (NEC 210.19(A)(1) and 210.20(A), sized at 125 % of the continuous load).
 * @param breakerAmps breaker rating, A
 * @returns A
 */
export function continuousLimit(breakerAmps: number): number {
  return breakerAmps * CONTINUOUS_LOAD_SHARE;
}

/**
 * Heat the lighting gives off into the room: all the power drawn at the wall, light included (the
 * light is absorbed in the room), q = fixtures × W. This is the lighting heat gain q = W × Ful × Fsa
 * of the ASHRAE Handbook—Fundamentals (chapter on nonresidential cooling loads; recalled from memory)
 * with every fixture on (Ful = 1) and the ballast or driver already in the wall power (Fsa = 1).
 * @param fixtures fixtures switched on, may be fractional
 * @param wallWatts input power of one fixture at the wall, W
 * @returns W (convert with wattsToBtuPerHour for BTU/h)
 */
export function lightingHeatWatts(fixtures: number, wallWatts: number): number {
  return fixtures * wallWatts;
}

/**
 * Whole fixtures one branch circuit carries at no more than 80 % of its breaker rating.
 * Example: 630 W at PF 0.95 on a 20 A, 240 V circuit draws 2.76 A each; 16 A / 2.76 A → 5 fixtures.
 * @returns a whole count, 0 when one fixture alone is above the continuous limit
 */
export function fixturesPerCircuit(input: CircuitInput): number {
  assertInput(input);
  const perFixture = fixtureCurrent(input.wallWatts, input.volts, input.powerFactor);
  return Math.floor(continuousLimit(input.breakerAmps) / perFixture + COUNT_TOLERANCE);
}

/**
 * Branch circuits a room of `fixtures` identical fixtures needs, the load on the heaviest one, and
 * the heat the whole fixtures give off.
 * A fractional (exact, leveled) count is rounded up first: one buys and wires whole fixtures.
 * @param input supply and fixture figures (W, V, A, PF)
 * @param fixtures fixtures in the room, may be fractional
 */
export function planCircuits(input: CircuitInput, fixtures: number): CircuitPlan {
  assertInput(input);
  if (!(fixtures >= 0) || !Number.isFinite(fixtures)) throw new RangeError('fixtures must be a finite number ≥ 0');
  const fixtureAmps = fixtureCurrent(input.wallWatts, input.volts, input.powerFactor);
  const perCircuit = fixturesPerCircuit(input);
  const whole = fixtures <= COUNT_TOLERANCE ? 0 : Math.ceil(fixtures - COUNT_TOLERANCE);
  const circuits = perCircuit === 0 ? null : Math.ceil(whole / perCircuit);
  return {
    fixtureAmps,
    continuousLimitAmps: continuousLimit(input.breakerAmps),
    fixturesPerCircuit: perCircuit,
    fixtures: whole,
    circuits,
    heaviestCircuitAmps: circuits === null ? null : Math.min(whole, perCircuit) * fixtureAmps,
    heatWatts: lightingHeatWatts(whole, input.wallWatts),
  };
}

function assertInput(i: CircuitInput): void {
  if (!(i.wallWatts > 0)) throw new RangeError('wallWatts must be greater than 0');
  if (!(i.volts > 0)) throw new RangeError('volts must be greater than 0');
  if (!(i.breakerAmps > 0)) throw new RangeError('breakerAmps must be greater than 0');
  if (!(i.powerFactor > 0 && i.powerFactor <= 1)) throw new RangeError('powerFactor must be in (0, 1]');
}
