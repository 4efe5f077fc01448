import { useMutation, useQueryClient } from '@tanstack/react-query';
import { scenarioResponseSchema } from '../../../contracts/api/scenarios';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** POST /api/workspaces/:wid/scenarios/:sid/duplicate: a copy titled "… (copy)" unless a title is given. */
export function duplicateScenario({ wid, sid, title }: { wid: string; sid: string; title?: string }) {
  return apiJson(apiPaths.duplicateScenario(wid, sid), scenarioResponseSchema, { method: 'POST', body: title ? { title } : {} });
}

export function useDuplicateScenario() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: duplicateScenario, onSuccess: () => qc.invalidateQueries({ queryKey: ['scenarios', 'list'] }) });
}
