import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from '../../../contracts/zod-messages';
import { updateWorkspaceRequestSchema, workspaceSchema } from '../../../contracts/api/workspaces';
import type { UpdateWorkspaceRequest } from '../../../contracts/api/workspaces';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';
import { meQueryKey } from '../../../lib/auth';

export { updateWorkspaceRequestSchema };
const replySchema = z.object({ workspace: workspaceSchema });

/** PATCH /api/workspaces/:wid (owners): name, currency, units. */
export function updateWorkspace({ wid, changes }: { wid: string; changes: UpdateWorkspaceRequest }) {
  return apiJson(apiPaths.workspace(wid), replySchema, { method: 'PATCH', body: changes });
}

export function useUpdateWorkspace() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateWorkspace,
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: ['workspaces'] }), qc.invalidateQueries({ queryKey: meQueryKey })]),
  });
}
