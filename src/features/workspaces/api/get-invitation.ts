import { queryOptions, useQuery } from '@tanstack/react-query';
import { invitationPreviewSchema } from '../../../contracts/api/invitations';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET /api/invitations/:token: what an invitation link offers. */
export function getInvitation(token: string, signal?: AbortSignal) {
  return apiJson(apiPaths.invitation(token), invitationPreviewSchema, { signal });
}

export function getInvitationQueryOptions(token: string) {
  return queryOptions({ queryKey: ['invitations', 'detail', token], queryFn: ({ signal }) => getInvitation(token, signal) });
}

export function useInvitation(token: string) {
  return useQuery(getInvitationQueryOptions(token));
}
