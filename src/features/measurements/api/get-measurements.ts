import { queryOptions, useQuery } from '@tanstack/react-query';
import { measurementListResponseSchema } from '../../../contracts/api/measurements';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET /api/workspaces/:wid/measurements: newest first, figures without the bulky data. */
export function getMeasurements(wid: string, signal?: AbortSignal) {
  return apiJson(apiPaths.measurements(wid), measurementListResponseSchema, { signal });
}

export function getMeasurementsQueryOptions(wid: string) {
  return queryOptions({ queryKey: ['measurements', 'list', wid], queryFn: ({ signal }) => getMeasurements(wid, signal) });
}

export function useMeasurements(wid: string) {
  return useQuery(getMeasurementsQueryOptions(wid));
}
