import { useMutation, useQueryClient } from '@tanstack/react-query';
import { scenarioResponseSchema, updateScenarioRequestSchema } from '../../../contracts/api/scenarios';
import type { UpdateScenarioRequest } from '../../../contracts/api/scenarios';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

export { updateScenarioRequestSchema };

/** PUT /api/workspaces/:wid/scenarios/:sid with If-Match: the revision the edit started from; a stale one is a 409 conflict. */
export function updateScenario({ wid, sid, revision, input }: { wid: string; sid: string; revision: number; input: UpdateScenarioRequest }) {
  return apiJson(apiPaths.scenario(wid, sid), scenarioResponseSchema, { method: 'PUT', body: input, headers: { 'if-match': String(revision) } });
}

export function useUpdateScenario() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateScenario,
    onSuccess: (data, v) => {
      qc.setQueryData(['scenarios', 'detail', v.sid], data);
      return Promise.all([
        qc.invalidateQueries({ queryKey: ['scenarios', 'list'] }),
        qc.invalidateQueries({ queryKey: ['scenarios', 'revisions', v.sid] }),
      ]);
    },
  });
}
