import { useMutation } from '@tanstack/react-query';
import { sendSnapshotResponseSchema } from '../../../contracts/api/snapshots';
import type { SendSnapshotRequest } from '../../../contracts/api/snapshots';
import { apiJson } from '../../../lib/api-client';
import { sharingApi } from './sharing-paths';

/** POST …/snapshots/:id/send: e-mails the link with a note to each address. */
export function sendSnapshot({ wid, id, body }: { wid: string; id: string; body: SendSnapshotRequest }) {
  return apiJson(sharingApi.send(wid, id), sendSnapshotResponseSchema, { method: 'POST', body });
}

export function useSendSnapshot() {
  return useMutation({ mutationFn: sendSnapshot });
}
