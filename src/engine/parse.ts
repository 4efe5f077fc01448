import { scenarioSchema } from '../contracts/scenario';
import type { Scenario } from '../contracts/scenario';
import { check } from '../contracts/problems';
import type { Checked } from '../contracts/problems';

/** Validates any value as a scenario file, reporting every problem with its field path. */
export function parseScenario(input: unknown): Checked<Scenario> {
  return check(scenarioSchema, input);
}
