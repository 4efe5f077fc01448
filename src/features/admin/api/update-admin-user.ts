import { useMutation, useQueryClient } from '@tanstack/react-query';
import { adminUserResponseSchema } from '../../../contracts/api/admin';
import type { UpdateAdminUserRequest } from '../../../contracts/api/admin';
import { apiJson } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/auth';
import { adminApiPaths } from './admin-api-paths';

/** PATCH /api/admin/users/:uid: rename, disable or enable an account, or give or take site-admin rights. */
export function updateAdminUser({ uid, ...body }: { uid: string } & UpdateAdminUserRequest) {
  return apiJson(adminApiPaths.user(uid), adminUserResponseSchema, { method: 'PATCH', body });
}

export function useUpdateAdminUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateAdminUser,
    // A site admin renaming their own account sees the new name in the header too.
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: ['admin', 'users'] }), qc.invalidateQueries({ queryKey: meQueryKey })]),
  });
}
