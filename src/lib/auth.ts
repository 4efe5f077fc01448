import { queryOptions, useQuery } from '@tanstack/react-query';
import { meResponseSchema } from '../contracts/api/account';
import type { MeResponse } from '../contracts/api/account';
import { apiJson, setCsrfToken } from './api-client';
import { apiPaths } from './api-paths';

/** GET /api/me: who is signed in and their workspaces; also hands the client its CSRF token. */
export async function getMe(signal?: AbortSignal): Promise<MeResponse> {
  const me = await apiJson(apiPaths.me(), meResponseSchema, { signal });
  setCsrfToken(me.csrfToken);
  return me;
}

export const meQueryKey = ['me'] as const;

export function getMeQueryOptions() {
  return queryOptions({ queryKey: meQueryKey, queryFn: ({ signal }) => getMe(signal), staleTime: 60_000 });
}

/** The signed-in person (or null) and their memberships; shared by every page. */
export function useMe() {
  return useQuery(getMeQueryOptions());
}
