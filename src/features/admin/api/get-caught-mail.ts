import { queryOptions, useQuery } from '@tanstack/react-query';
import { caughtMailListResponseSchema } from '../../../contracts/api/admin';
import { apiJson } from '../../../lib/api-client';
import { adminApiPaths } from './admin-api-paths';

/** GET /api/admin/mail: what the local fake mail server caught, newest first (at most 200). */
export function getCaughtMail(signal?: AbortSignal) {
  return apiJson(adminApiPaths.mail(), caughtMailListResponseSchema, { signal });
}

export function getCaughtMailQueryOptions() {
  return queryOptions({ queryKey: ['admin', 'mail'], queryFn: ({ signal }) => getCaughtMail(signal), retry: false });
}

export function useCaughtMail() {
  return useQuery(getCaughtMailQueryOptions());
}
