import { queryOptions, useQuery } from '@tanstack/react-query';
import { revisionListResponseSchema } from '../../../contracts/api/scenarios';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET …/scenarios/:sid/revisions: newest first. */
export function getRevisions(wid: string, sid: string, signal?: AbortSignal) {
  return apiJson(apiPaths.revisions(wid, sid), revisionListResponseSchema, { signal });
}

export function getRevisionsQueryOptions(wid: string, sid: string) {
  return queryOptions({ queryKey: ['scenarios', 'revisions', sid], queryFn: ({ signal }) => getRevisions(wid, sid, signal) });
}

export function useRevisions(wid: string, sid: string) {
  return useQuery(getRevisionsQueryOptions(wid, sid));
}
