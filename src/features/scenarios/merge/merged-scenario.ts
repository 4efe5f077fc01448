import { scenarioSchema } from '../../../contracts/scenario';
import type { Scenario } from '../../../contracts/scenario';
import { check } from '../../../contracts/problems';
import type { Checked } from '../../../contracts/problems';
import { settle } from './three-way-merge';
import type { Side, ThreeWayMerge } from './three-way-merge';

/**
 * The settled merge checked against the scenario schema: two changes that are each valid can
 * together break a rule (a phase longer on one side and another phase added on the other can pass
 * 366 days), so the result is parsed again and every problem reported; such a merge is not saved.
 */
export function mergedScenario(merge: ThreeWayMerge, choices: Readonly<Record<string, Side>>): Checked<Scenario> {
  return check(scenarioSchema, settle(merge, choices));
}
