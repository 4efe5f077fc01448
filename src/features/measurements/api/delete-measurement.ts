import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiVoid } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** DELETE /api/workspaces/:wid/measurements/:mid: fixtures fed by it keep their figures and lose the link. */
export function deleteMeasurement({ wid, mid }: { wid: string; mid: string }) {
  return apiVoid(apiPaths.measurement(wid, mid), { method: 'DELETE' });
}

export function useDeleteMeasurement() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteMeasurement,
    onSuccess: (_d, v) => Promise.all([qc.invalidateQueries({ queryKey: ['measurements'] }), qc.invalidateQueries({ queryKey: ['fixtures', 'list', v.wid] })]),
  });
}
