import { useMutation, useQueryClient } from '@tanstack/react-query';
import { snapshotSummaryResponseSchema } from '../../../contracts/api/snapshots';
import type { CreateSnapshotRequest } from '../../../contracts/api/snapshots';
import { apiJson } from '../../../lib/api-client';
import { sharingApi } from './sharing-paths';

/** POST …/scenarios/:sid/snapshots: freezes the scenario's saved revision; the server computes the figures. */
export function createSnapshot({ wid, sid, body }: { wid: string; sid: string; body: CreateSnapshotRequest }) {
  return apiJson(sharingApi.scenarioSnapshots(wid, sid), snapshotSummaryResponseSchema, { method: 'POST', body });
}

export function useCreateSnapshot() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createSnapshot, onSuccess: () => qc.invalidateQueries({ queryKey: ['snapshots', 'of-scenario'] }) });
}
