import { analysisResponseSchema } from '../../../contracts/api/analysis';
import type { AnalysisSettings } from '../../../contracts/api/analysis';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** PUT …/scenarios/:sid/analysis (editors and owners): keeps these settings with the scenario. */
export function saveAnalysis(wid: string, sid: string, settings: AnalysisSettings) {
  return apiJson(apiPaths.scenarioAnalysis(wid, sid), analysisResponseSchema, { method: 'PUT', body: { settings } });
}
