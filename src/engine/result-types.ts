/** Format tag of a computed result, version 1. */
export const RESULT_FORMAT = 'photon-parity/result@1';

/** One row of an option's yearly ledger; money as full-precision decimal text. Year 0 holds the capital outlay. */
export interface LedgerYear {
  year: number;
  capex: string;
  energy: string;
  cooling: string;
  demand: string;
  lamps: string;
  total: string;
  cumulative: string;
}

/** Everything computed for one option. Counts and physical figures are numbers; money is decimal text. */
export interface OptionResult {
  id: string;
  /** fixtures, fractional */
  fixturesExact: number;
  /** fixtures, rounded up */
  fixturesWhole: number;
  /** fixtures the costs follow */
  fixturesUsed: number;
  /** µmol m⁻² s⁻¹ */
  achievedPpfd: number;
  /** kWh per year of lighting */
  energyKwhPerYear: number;
  /** kWh per year the cooling equipment draws to remove the lighting heat */
  coolingKwhPerYear: number;
  capex: string;
  energyCost: string;
  coolingCost: string;
  demandCost: string;
  lampCost: string;
  totalNominal: string;
  totalPresentValue: string;
  /** present value per mol of photons delivered to the canopy over the horizon */
  costPerMol: string;
  /** years until cumulative cost is at or below the baseline's; null if never, or for the baseline */
  paybackYears: number | null;
  years: LedgerYear[];
}

/** `photon-parity/result@1`: the output of compute. */
export interface ScenarioResult {
  format: typeof RESULT_FORMAT;
  engineVersion: string;
  /** SHA-256 (hex) of the canonical scenario JSON */
  inputHash: string;
  /** m² */
  canopyAreaM2: number;
  /** µmol m⁻² s⁻¹ */
  targetPpfd: number;
  /** h */
  litHoursPerYear: number;
  /** id of the option with the lowest present value (first in file order on a tie) */
  cheapest: string;
  options: OptionResult[];
}
