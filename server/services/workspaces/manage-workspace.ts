import type { CreateWorkspaceRequest, UpdateWorkspaceRequest, Workspace } from '../../../src/contracts/api/workspaces';
import type { Models } from '../../db/models';
import type { WorkspaceAccess } from '../../http/context';
import { recordAudit } from '../../repos/audit';
import { deleteWorkspaceRow, insertWorkspace, updateWorkspaceRow, workspaceView } from '../../repos/workspaces';
import { withdrawWorkspaceLinks } from '../../repos/snapshots';
import { snapshotReader } from '../snapshots/read-snapshot';

/** Creates a workspace owned by the caller. */
export async function createWorkspace(m: Models, input: Required<CreateWorkspaceRequest>, userId: string, ip: string | null): Promise<Workspace> {
  return m.sequelize.transaction(async (t) => {
    const row = await insertWorkspace(m, input, userId, t);
    await recordAudit(m, { action: 'workspace_created', actorUserId: userId, workspaceId: row.id, ip }, t);
    return workspaceView(m, row, 'owner', t);
  });
}

/** Changes a workspace's name, currency or unit system. */
export async function updateWorkspace(m: Models, a: WorkspaceAccess, patch: UpdateWorkspaceRequest): Promise<Workspace> {
  const row = await updateWorkspaceRow(m, a.workspace.id, patch);
  return workspaceView(m, row, a.role);
}

/** Deletes a workspace and everything in it; its shared links answer 410 (withdrawn) from then on. */
export async function deleteWorkspace(m: Models, a: WorkspaceAccess, userId: string, ip: string | null): Promise<void> {
  await m.sequelize.transaction(async (t) => {
    await withdrawWorkspaceLinks(m, a.workspace.id, t);
    await deleteWorkspaceRow(m, a.workspace.id, t);
    await recordAudit(m, { action: 'workspace_deleted', actorUserId: userId, workspaceId: a.workspace.id, target: a.workspace.name, ip }, t);
  });
  snapshotReader(m).linksChanged();
}
