import { useMutation, useQueryClient } from '@tanstack/react-query';
import { scenarioResponseSchema } from '../../../contracts/api/scenarios';
import type { CreateScenarioRequest } from '../../../contracts/api/scenarios';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** POST /api/workspaces/:wid/scenarios (editors and owners). */
export function createScenario({ wid, input }: { wid: string; input: CreateScenarioRequest }) {
  return apiJson(apiPaths.scenarios(wid), scenarioResponseSchema, { method: 'POST', body: input });
}

export function useCreateScenario() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createScenario, onSuccess: () => qc.invalidateQueries({ queryKey: ['scenarios', 'list'] }) });
}
