import { Router } from 'express';
import type { Request } from 'express';
import { emptyBodySchema } from '../../src/contracts/api/common';
import { sendSnapshotRequestSchema, snapshotIdSchema, updateSnapshotLinkRequestSchema } from '../../src/contracts/api/snapshots';
import type { SnapshotSummary } from '../../src/contracts/api/snapshots';
import { workspaceRole } from '../http/access';
import { AppError } from '../http/app-error';
import { accessOf, clientIp, requireCaller } from '../http/context';
import { parseBody } from '../http/validate';
import { recordAudit } from '../repos/audit';
import { findLinkRow, findSnapshotRow, listSnapshotRows, revokeLink, setLinkExpiry } from '../repos/snapshots';
import { snapshotReader } from '../services/snapshots/read-snapshot';
import { sendSnapshot } from '../services/snapshots/send-snapshot';
import { snapshotSummary } from '../services/snapshots/snapshot-views';
import { publicOrigin } from './api-deps';
import type { ApiDeps } from './api-deps';
import { snapshotMailLimit } from './snapshots-limits';

/** /api/workspaces/:wid/snapshots (editors and owners): list, set an expiry, revoke, send by e-mail. */
export function workspaceSnapshotsRouter({ m, sequelize, mailer, config }: ApiDeps): Router {
  const router = Router({ mergeParams: true });
  const editors = workspaceRole(sequelize, 'editor');
  const mailLimit = snapshotMailLimit();
  const wid = (req: Request) => accessOf(req).workspace.id;
  const existing = async (req: Request): Promise<SnapshotSummary> => {
    const id = snapshotIdSchema.safeParse(req.params.id);
    const row = id.success ? await findSnapshotRow(m, wid(req), id.data) : null;
    const link = row ? await findLinkRow(m, row.id) : null;
    if (!row || !link) throw new AppError('not_found', 'There is no such snapshot in this workspace.');
    return snapshotSummary(row, link);
  };

  router.get('/', editors, async (req, res) => {
    res.json({ snapshots: (await listSnapshotRows(m, wid(req))).map((r) => snapshotSummary(r.snapshot, r.link)) });
  });
  router.patch('/:id', editors, async (req, res) => {
    const input = parseBody(updateSnapshotLinkRequestSchema, req);
    const found = await existing(req);
    if (found.link.status === 'revoked') throw new AppError('conflict', 'This link was withdrawn; publish a new snapshot to share again.', [{ path: 'link', message: 'revoked' }]);
    await setLinkExpiry(m, found.id, input.expiresAt ? new Date(input.expiresAt) : null);
    snapshotReader(m).linksChanged();
    await recordAudit(m, { action: 'snapshot_expiry_set', actorUserId: requireCaller(req).user.id, workspaceId: wid(req), target: found.id, ip: clientIp(req), details: { expiresAt: input.expiresAt } });
    res.json({ snapshot: await existing(req) });
  });
  router.post('/:id/revoke', editors, async (req, res) => {
    parseBody(emptyBodySchema, req, { optional: true });
    const found = await existing(req);
    await revokeLink(m, found.id, requireCaller(req).user.id);
    snapshotReader(m).linksChanged();
    await recordAudit(m, { action: 'snapshot_revoked', actorUserId: requireCaller(req).user.id, workspaceId: wid(req), target: found.id, ip: clientIp(req) });
    res.json({ snapshot: await existing(req) });
  });
  router.post('/:id/send', editors, mailLimit, async (req, res) => {
    const input = parseBody(sendSnapshotRequestSchema, req);
    const sent = await sendSnapshot(m, mailer, {
      snapshot: await existing(req),
      sender: requireCaller(req).user,
      to: input.to,
      note: input.note,
      origin: publicOrigin(req, config),
      ip: clientIp(req),
    });
    res.json({ sent });
  });
  return router;
}
