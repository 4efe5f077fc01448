import { queryOptions, useQuery } from '@tanstack/react-query';
import { workspaceListResponseSchema } from '../../../contracts/api/workspaces';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET /api/workspaces: the caller's workspaces with their role in each. */
export function getWorkspaces(signal?: AbortSignal) {
  return apiJson(apiPaths.workspaces(), workspaceListResponseSchema, { signal });
}

export function getWorkspacesQueryOptions() {
  return queryOptions({ queryKey: ['workspaces', 'list'], queryFn: ({ signal }) => getWorkspaces(signal) });
}

export function useWorkspaces() {
  return useQuery(getWorkspacesQueryOptions());
}
