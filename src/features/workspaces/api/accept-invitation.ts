import { useMutation, useQueryClient } from '@tanstack/react-query';
import { acceptInvitationResponseSchema } from '../../../contracts/api/invitations';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';
import { meQueryKey } from '../../../lib/auth';

/** POST /api/invitations/:token/accept: joins the workspace. */
export function acceptInvitation(token: string) {
  return apiJson(apiPaths.acceptInvitation(token), acceptInvitationResponseSchema, { method: 'POST', body: {} });
}

export function useAcceptInvitation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (_d, token) =>
      Promise.all([qc.invalidateQueries({ queryKey: meQueryKey }), qc.invalidateQueries({ queryKey: ['workspaces'] }), qc.invalidateQueries({ queryKey: ['invitations', 'detail', token] })]),
  });
}
