import type { ScenarioResult } from '../../engine/result-types';
import { z } from '../zod-messages';

const money = z.string().regex(/^-?\d+(\.\d+)?(e[-+]?\d+)?$/i);

export const ledgerYearSchema = z.object({
  year: z.number().int(),
  capex: money,
  energy: money,
  cooling: money,
  demand: money,
  lamps: money,
  total: money,
  cumulative: money,
});

export const optionResultSchema = z.object({
  id: z.string(),
  fixturesExact: z.number(),
  fixturesWhole: z.number(),
  fixturesUsed: z.number(),
  achievedPpfd: z.number(),
  energyKwhPerYear: z.number(),
  coolingKwhPerYear: z.number(),
  capex: money,
  energyCost: money,
  coolingCost: money,
  demandCost: money,
  lampCost: money,
  totalNominal: money,
  totalPresentValue: money,
  costPerMol: money,
  paybackYears: z.number().nullable(),
  years: z.array(ledgerYearSchema),
});

/**
 * GET …/scenarios/:sid/result: the engine's `photon-parity/result@1`, computed by the server from
 * the stored document (never from figures a client sent), with the revision it was computed from.
 */
export const scenarioResultSchema = z.object({
  format: z.literal('photon-parity/result@1'),
  engineVersion: z.string(),
  inputHash: z.string(),
  canopyAreaM2: z.number(),
  targetPpfd: z.number(),
  litHoursPerYear: z.number(),
  cheapest: z.string(),
  options: z.array(optionResultSchema),
});

export const scenarioResultResponseSchema = z.object({
  scenarioId: z.string(),
  revision: z.number().int(),
  result: scenarioResultSchema,
});
export type ScenarioResultResponse = z.infer<typeof scenarioResultResponseSchema>;

// The schema and the engine's type must describe the same thing; this line fails to compile if they drift.
export const resultSchemaMatchesEngine: [z.infer<typeof scenarioResultSchema>] extends [ScenarioResult]
  ? [ScenarioResult] extends [z.infer<typeof scenarioResultSchema>] ? true : false
  : false = true;
