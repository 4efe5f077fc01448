import { queryOptions, useQuery } from '@tanstack/react-query';
import { snapshotResponseSchema } from '../../../contracts/api/snapshots';
import { apiJson } from '../../../lib/api-client';
import { sharingApi } from './sharing-paths';

/** GET /api/snapshots/:id without signing in: 404 unknown, 410 revoked or expired. */
export function getSharedSnapshot(id: string, signal?: AbortSignal) {
  return apiJson(sharingApi.snapshot(id), snapshotResponseSchema, { signal });
}

export function getSharedSnapshotQueryOptions(id: string) {
  return queryOptions({ queryKey: ['snapshots', 'shared', id], queryFn: ({ signal }) => getSharedSnapshot(id, signal), staleTime: 60_000 });
}

export function useSharedSnapshot(id: string) {
  return useQuery(getSharedSnapshotQueryOptions(id));
}
