import type { Scenario } from '../contracts/scenario';
import { parseScenario } from '../engine';
import { InputError } from './errors';
import { parseJsonFile, readInputFile } from './io';

/** Reads and validates a scenario file; every problem becomes one line of an InputError. */
export function loadScenarioFile(path: string | undefined): Scenario {
  const text = readInputFile(path);
  const checked = parseScenario(parseJsonFile(path ?? '', text));
  if (!checked.ok) throw new InputError(checked.problems);
  return checked.value;
}
