import { useMutation, useQueryClient } from '@tanstack/react-query';
import { memberResponseSchema } from '../../../contracts/api/members';
import type { Role } from '../../../contracts/api/common';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** PATCH /api/workspaces/:wid/members/:userId (owners): change a member's role. */
export function updateMember({ wid, userId, role }: { wid: string; userId: string; role: Role }) {
  return apiJson(apiPaths.member(wid, userId), memberResponseSchema, { method: 'PATCH', body: { role } });
}

export function useUpdateMember() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updateMember, onSuccess: (_d, v) => qc.invalidateQueries({ queryKey: ['workspaces', 'members', v.wid] }) });
}
