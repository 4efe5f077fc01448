import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiVoid } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** DELETE /api/workspaces/:wid/invitations/:iid (owners). */
export function revokeInvitation({ wid, iid }: { wid: string; iid: string }) {
  return apiVoid(apiPaths.invitationOfWorkspace(wid, iid), { method: 'DELETE' });
}

export function useRevokeInvitation() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: revokeInvitation, onSuccess: (_d, v) => qc.invalidateQueries({ queryKey: ['workspaces', 'invitations', v.wid] }) });
}
