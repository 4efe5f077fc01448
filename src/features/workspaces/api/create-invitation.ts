import { useMutation, useQueryClient } from '@tanstack/react-query';
import { createInvitationRequestSchema, invitationResponseSchema } from '../../../contracts/api/invitations';
import type { CreateInvitationRequest } from '../../../contracts/api/invitations';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

export { createInvitationRequestSchema };

/** POST /api/workspaces/:wid/invitations (owners): e-mails a one-use link. */
export function createInvitation({ wid, input }: { wid: string; input: CreateInvitationRequest }) {
  return apiJson(apiPaths.invitations(wid), invitationResponseSchema, { method: 'POST', body: input });
}

export function useCreateInvitation() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createInvitation, onSuccess: (_d, v) => qc.invalidateQueries({ queryKey: ['workspaces', 'invitations', v.wid] }) });
}
