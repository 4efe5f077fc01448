import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiVoid } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** DELETE /api/workspaces/:wid/scenarios/:sid (editors and owners). */
export function deleteScenario({ wid, sid }: { wid: string; sid: string }) {
  return apiVoid(apiPaths.scenario(wid, sid), { method: 'DELETE' });
}

export function useDeleteScenario() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteScenario,
    onSuccess: (_d, v) => {
      qc.removeQueries({ queryKey: ['scenarios', 'detail', v.sid] });
      return qc.invalidateQueries({ queryKey: ['scenarios', 'list'] });
    },
  });
}
