import { useMutation, useQueryClient } from '@tanstack/react-query';
import { scenarioResponseSchema } from '../../../contracts/api/scenarios';
import type { ForkSnapshotRequest } from '../../../contracts/api/snapshots';
import { apiJson } from '../../../lib/api-client';
import { sharingApi } from './sharing-paths';

/** POST /api/snapshots/:id/fork: a new scenario in a workspace where the reader edits. */
export function forkSnapshot({ id, body }: { id: string; body: ForkSnapshotRequest }) {
  return apiJson(sharingApi.fork(id), scenarioResponseSchema, { method: 'POST', body });
}

export function useForkSnapshot() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: forkSnapshot, onSuccess: () => qc.invalidateQueries({ queryKey: ['scenarios', 'list'] }) });
}
