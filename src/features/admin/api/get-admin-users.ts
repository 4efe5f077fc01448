import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { adminUserListResponseSchema } from '../../../contracts/api/admin';
import { apiJson } from '../../../lib/api-client';
import { adminApiPaths } from './admin-api-paths';

/** Accounts shown on one page of the list. */
export const ACCOUNTS_PAGE_SIZE = 20;

/** GET /api/admin/users: one page of accounts whose e-mail or name contains `q`. */
export function getAdminUsers(q: { q: string; page: number }, signal?: AbortSignal) {
  return apiJson(adminApiPaths.users({ ...q, pageSize: ACCOUNTS_PAGE_SIZE }), adminUserListResponseSchema, { signal });
}

export function getAdminUsersQueryOptions(q: { q: string; page: number }) {
  return queryOptions({
    queryKey: ['admin', 'users', 'list', q],
    queryFn: ({ signal }) => getAdminUsers(q, signal),
    placeholderData: keepPreviousData,
    retry: false,
  });
}

export function useAdminUsers(q: { q: string; page: number }) {
  return useQuery(getAdminUsersQueryOptions(q));
}
