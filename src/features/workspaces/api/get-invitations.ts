import { queryOptions, useQuery } from '@tanstack/react-query';
import { invitationListResponseSchema } from '../../../contracts/api/invitations';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET /api/workspaces/:wid/invitations (owners). */
export function getInvitations(wid: string, signal?: AbortSignal) {
  return apiJson(apiPaths.invitations(wid), invitationListResponseSchema, { signal });
}

export function getInvitationsQueryOptions(wid: string) {
  return queryOptions({ queryKey: ['workspaces', 'invitations', wid], queryFn: ({ signal }) => getInvitations(wid, signal) });
}

export function useInvitations(wid: string, enabled = true) {
  return useQuery({ ...getInvitationsQueryOptions(wid), enabled });
}
