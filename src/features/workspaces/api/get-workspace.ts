import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from '../../../contracts/zod-messages';
import { workspaceSchema } from '../../../contracts/api/workspaces';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

const replySchema = z.object({ workspace: workspaceSchema });

/** GET /api/workspaces/:wid */
export function getWorkspace(wid: string, signal?: AbortSignal) {
  return apiJson(apiPaths.workspace(wid), replySchema, { signal });
}

export function getWorkspaceQueryOptions(wid: string) {
  return queryOptions({ queryKey: ['workspaces', 'detail', wid], queryFn: ({ signal }) => getWorkspace(wid, signal) });
}

export function useWorkspaceDetail(wid: string) {
  return useQuery(getWorkspaceQueryOptions(wid));
}
