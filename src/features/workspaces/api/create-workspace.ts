import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from '../../../contracts/zod-messages';
import { createWorkspaceRequestSchema, workspaceSchema } from '../../../contracts/api/workspaces';
import type { CreateWorkspaceRequest } from '../../../contracts/api/workspaces';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';
import { meQueryKey } from '../../../lib/auth';

export { createWorkspaceRequestSchema };
const replySchema = z.object({ workspace: workspaceSchema });

/** POST /api/workspaces: the caller becomes the owner. */
export function createWorkspace(input: CreateWorkspaceRequest) {
  return apiJson(apiPaths.workspaces(), replySchema, { method: 'POST', body: input });
}

export function useCreateWorkspace() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createWorkspace,
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: ['workspaces'] }), qc.invalidateQueries({ queryKey: meQueryKey })]),
  });
}
