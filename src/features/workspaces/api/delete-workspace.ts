import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiVoid } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';
import { meQueryKey } from '../../../lib/auth';

/** DELETE /api/workspaces/:wid (owners). */
export function deleteWorkspace(wid: string) {
  return apiVoid(apiPaths.workspace(wid), { method: 'DELETE' });
}

export function useDeleteWorkspace() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteWorkspace,
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: ['workspaces'] }), qc.invalidateQueries({ queryKey: meQueryKey })]),
  });
}
