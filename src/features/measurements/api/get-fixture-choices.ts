import { queryOptions, useQuery } from '@tanstack/react-query';
import { fixtureListResponseSchema } from '../../../contracts/api/fixtures';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET /api/workspaces/:wid/fixtures, under the library's own query key so both pages share one copy. */
export function getFixtureChoicesQueryOptions(wid: string) {
  return queryOptions({
    queryKey: ['fixtures', 'list', wid],
    queryFn: ({ signal }) => apiJson(apiPaths.fixtures(wid), fixtureListResponseSchema, { signal }),
  });
}

export function useFixtureChoices(wid: string) {
  return useQuery(getFixtureChoicesQueryOptions(wid));
}
