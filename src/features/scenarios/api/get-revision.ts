import { queryOptions, useQuery } from '@tanstack/react-query';
import { revisionResponseSchema } from '../../../contracts/api/scenarios';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET …/scenarios/:sid/revisions/:rev: the document as it was then. */
export function getRevision(wid: string, sid: string, rev: number, signal?: AbortSignal) {
  return apiJson(apiPaths.revision(wid, sid, rev), revisionResponseSchema, { signal });
}

export function getRevisionQueryOptions(wid: string, sid: string, rev: number) {
  return queryOptions({ queryKey: ['scenarios', 'revisions', sid, rev], queryFn: ({ signal }) => getRevision(wid, sid, rev, signal), staleTime: Infinity });
}

export function useRevision(wid: string, sid: string, rev: number | null) {
  return useQuery({ ...getRevisionQueryOptions(wid, sid, rev ?? 0), enabled: rev !== null });
}
