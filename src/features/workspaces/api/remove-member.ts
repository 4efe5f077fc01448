import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiVoid } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** DELETE /api/workspaces/:wid/members/:userId (owners, or a member leaving). */
export function removeMember({ wid, userId }: { wid: string; userId: string }) {
  return apiVoid(apiPaths.member(wid, userId), { method: 'DELETE' });
}

export function useRemoveMember() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: removeMember, onSuccess: (_d, v) => qc.invalidateQueries({ queryKey: ['workspaces', 'members', v.wid] }) });
}
