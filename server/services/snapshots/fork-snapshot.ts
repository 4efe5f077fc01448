import type { ScenarioRecord } from '../../../src/contracts/api/scenarios';
import type { PublicSnapshot } from '../../../src/contracts/api/snapshots';
import type { Scenario } from '../../../src/contracts/scenario';
import type { Models } from '../../db/models';
import { roleAtLeast } from '../../http/access';
import { AppError } from '../../http/app-error';
import { recordAudit } from '../../repos/audit';
import { saveAnalysis } from '../../repos/scenario-analysis';
import { insertScenario, scenarioRecord } from '../../repos/scenarios';
import { insertFork } from '../../repos/snapshots';
import { findMembership } from '../../repos/workspaces';

export interface ForkSnapshot {
  snapshot: PublicSnapshot;
  workspaceId: string;
  title: string | undefined;
  userId: string;
  ip: string | null;
}

/**
 * Copies a snapshot's scenario into a workspace where the caller is an editor or owner, as a new
 * scenario at revision 1 that remembers the snapshot it came from and keeps the sensitivity settings
 * frozen with it (seed included), so the copy reruns the same draws. Not a member: 404, as everywhere.
 */
export async function forkSnapshot(m: Models, f: ForkSnapshot): Promise<ScenarioRecord> {
  const membership = await findMembership(m, f.workspaceId, f.userId);
  if (!membership) throw new AppError('not_found', 'There is no such workspace, or you are not a member of it.', [{ path: 'workspaceId', message: 'is not a workspace of yours' }]);
  if (!roleAtLeast(membership.role, 'editor')) {
    throw new AppError('forbidden', `Copying into a workspace needs the editor role there; yours is ${membership.role}.`, [{ path: 'workspaceId', message: 'needs the editor role' }]);
  }
  const document: Scenario = { ...f.snapshot.scenario, title: f.title ?? f.snapshot.scenario.title };
  return m.sequelize.transaction(async (t) => {
    const row = await insertScenario(m, f.workspaceId, document, f.userId, { action: 'created', fromRevision: null }, t);
    await insertFork(m, { scenarioId: row.id, snapshotId: f.snapshot.id, forkedBy: f.userId }, t);
    if (f.snapshot.analysis) await saveAnalysis(m, row.id, f.snapshot.analysis, f.userId, t);
    await recordAudit(m, { action: 'snapshot_forked', actorUserId: f.userId, workspaceId: f.workspaceId, target: f.snapshot.id, ip: f.ip, details: { scenarioId: row.id } }, t);
    return scenarioRecord(m, row, t);
  });
}
