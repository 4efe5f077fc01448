import { useMutation, useQueryClient } from '@tanstack/react-query';
import { snapshotSummaryResponseSchema } from '../../../contracts/api/snapshots';
import { apiJson } from '../../../lib/api-client';
import { sharingApi } from './sharing-paths';

/** PATCH …/snapshots/:id: a new expiry (ISO instant) or none. */
export function setSnapshotExpiry({ wid, id, expiresAt }: { wid: string; id: string; expiresAt: string | null }) {
  return apiJson(sharingApi.workspaceSnapshot(wid, id), snapshotSummaryResponseSchema, { method: 'PATCH', body: { expiresAt } });
}

/** POST …/snapshots/:id/revoke: withdraws the link for good. */
export function revokeSnapshot({ wid, id }: { wid: string; id: string }) {
  return apiJson(sharingApi.revoke(wid, id), snapshotSummaryResponseSchema, { method: 'POST', body: {} });
}

export function useSetSnapshotExpiry() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: setSnapshotExpiry, onSuccess: () => qc.invalidateQueries({ queryKey: ['snapshots'] }) });
}

export function useRevokeSnapshot() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: revokeSnapshot, onSuccess: () => qc.invalidateQueries({ queryKey: ['snapshots'] }) });
}
