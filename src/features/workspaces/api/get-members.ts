import { queryOptions, useQuery } from '@tanstack/react-query';
import { memberListResponseSchema } from '../../../contracts/api/members';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET /api/workspaces/:wid/members */
export function getMembers(wid: string, signal?: AbortSignal) {
  return apiJson(apiPaths.members(wid), memberListResponseSchema, { signal });
}

export function getMembersQueryOptions(wid: string) {
  return queryOptions({ queryKey: ['workspaces', 'members', wid], queryFn: ({ signal }) => getMembers(wid, signal) });
}

export function useMembers(wid: string) {
  return useQuery(getMembersQueryOptions(wid));
}
