import { queryOptions, useQuery } from '@tanstack/react-query';
import { scenarioResponseSchema } from '../../../contracts/api/scenarios';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET /api/workspaces/:wid/scenarios/:sid: the stored document and its revision. */
export function getScenario(wid: string, sid: string, signal?: AbortSignal) {
  return apiJson(apiPaths.scenario(wid, sid), scenarioResponseSchema, { signal });
}

export function getScenarioQueryOptions(wid: string, sid: string) {
  return queryOptions({ queryKey: ['scenarios', 'detail', sid], queryFn: ({ signal }) => getScenario(wid, sid, signal), staleTime: Infinity });
}

export function useScenario(wid: string, sid: string) {
  return useQuery(getScenarioQueryOptions(wid, sid));
}
