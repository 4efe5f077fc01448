import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { scenarioListResponseSchema } from '../../../contracts/api/scenarios';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

export interface ScenarioListQuery {
  q?: string;
  page?: number;
  pageSize?: number;
}

/** GET /api/workspaces/:wid/scenarios?q=&page=&pageSize= */
export function getScenarios(wid: string, query: ScenarioListQuery, signal?: AbortSignal) {
  return apiJson(apiPaths.scenarios(wid, query), scenarioListResponseSchema, { signal });
}

export function getScenariosQueryOptions(wid: string, query: ScenarioListQuery) {
  return queryOptions({
    queryKey: ['scenarios', 'list', wid, query],
    queryFn: ({ signal }) => getScenarios(wid, query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useScenarios(wid: string, query: ScenarioListQuery) {
  return useQuery(getScenariosQueryOptions(wid, query));
}
