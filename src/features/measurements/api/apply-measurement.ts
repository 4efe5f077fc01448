import { useMutation, useQueryClient } from '@tanstack/react-query';
import { applyMeasurementResponseSchema } from '../../../contracts/api/measurements';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** POST …/measurements/:mid/apply: sets a library fixture's efficacy (grid) or spectrum summary (spectrum) from the measurement. */
export function applyMeasurement({ wid, mid, fixtureId, shareOnArea }: { wid: string; mid: string; fixtureId: string; shareOnArea?: number }) {
  return apiJson(apiPaths.applyMeasurement(wid, mid), applyMeasurementResponseSchema, { method: 'POST', body: { fixtureId, ...(shareOnArea === undefined ? {} : { shareOnArea }) } });
}

export function useApplyMeasurement() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: applyMeasurement,
    onSuccess: (_d, v) => Promise.all([qc.invalidateQueries({ queryKey: ['measurements'] }), qc.invalidateQueries({ queryKey: ['fixtures', 'list', v.wid] })]),
  });
}
