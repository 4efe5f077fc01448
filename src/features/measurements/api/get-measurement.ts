import { queryOptions, useQuery } from '@tanstack/react-query';
import { measurementDetailResponseSchema } from '../../../contracts/api/measurements';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** GET /api/workspaces/:wid/measurements/:mid: the figures and the data to draw them. */
export function getMeasurement(wid: string, mid: string, signal?: AbortSignal) {
  return apiJson(apiPaths.measurement(wid, mid), measurementDetailResponseSchema, { signal });
}

export function getMeasurementQueryOptions(wid: string, mid: string) {
  return queryOptions({ queryKey: ['measurements', 'detail', wid, mid], queryFn: ({ signal }) => getMeasurement(wid, mid, signal) });
}

export function useMeasurement(wid: string, mid: string) {
  return useQuery(getMeasurementQueryOptions(wid, mid));
}
