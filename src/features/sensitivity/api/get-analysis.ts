import { queryOptions } from '@tanstack/react-query';
import { analysisResponseSchema } from '../../../contracts/api/analysis';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET …/scenarios/:sid/analysis: the sensitivity settings (and seed) kept with the scenario. */
export function getAnalysis(wid: string, sid: string, signal?: AbortSignal) {
  return apiJson(apiPaths.scenarioAnalysis(wid, sid), analysisResponseSchema, { signal });
}

export function getAnalysisQueryOptions(wid: string, sid: string) {
  return queryOptions({ queryKey: ['scenarios', 'analysis', sid], queryFn: ({ signal }) => getAnalysis(wid, sid, signal), staleTime: Infinity, retry: 2 });
}
