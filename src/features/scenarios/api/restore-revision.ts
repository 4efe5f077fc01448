import { useMutation, useQueryClient } from '@tanstack/react-query';
import { scenarioResponseSchema } from '../../../contracts/api/scenarios';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** POST …/revisions/:rev/restore: the old document becomes a new revision; history is never rewritten. */
export function restoreRevision({ wid, sid, rev }: { wid: string; sid: string; rev: number }) {
  return apiJson(apiPaths.restoreRevision(wid, sid, rev), scenarioResponseSchema, { method: 'POST', body: {} });
}

export function useRestoreRevision() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: restoreRevision,
    onSuccess: (data, v) => {
      qc.setQueryData(['scenarios', 'detail', v.sid], data);
      return Promise.all([qc.invalidateQueries({ queryKey: ['scenarios', 'revisions', v.sid] }), qc.invalidateQueries({ queryKey: ['scenarios', 'list'] })]);
    },
  });
}
