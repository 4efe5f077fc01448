import type { ScenarioResultResponse } from '../../../src/contracts/api/result';
import { computeScenario, parseScenario } from '../../../src/engine';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { findScenarioRow } from '../../repos/scenarios';

/** Computes a stored scenario with the engine, from the stored document only. */
export async function computeStoredScenario(m: Models, workspaceId: string, id: string): Promise<ScenarioResultResponse> {
  const row = await findScenarioRow(m, workspaceId, id);
  if (!row) throw new AppError('not_found', 'There is no such scenario in this workspace.');
  const checked = parseScenario(JSON.parse(row.document));
  if (!checked.ok) throw new AppError('conflict', 'The stored scenario does not pass the current checks; open it and fix the fields named.', checked.problems);
  return { scenarioId: row.id, revision: row.revision, result: computeScenario(checked.value) };
}
