import { nanoid } from 'nanoid';
import type { SnapshotSummary } from '../../../src/contracts/api/snapshots';
import { canonicalScenarioJson, computeScenario, ENGINE_VERSION, parseScenario, scenarioHash } from '../../../src/engine';
import type { Models } from '../../db/models';
import type { UserRow } from '../../db/models/users';
import { AppError } from '../../http/app-error';
import { recordAudit } from '../../repos/audit';
import { listFixtureRows } from '../../repos/fixtures';
import { findAnalysis } from '../../repos/scenario-analysis';
import { findScenarioRow } from '../../repos/scenarios';
import { insertSnapshot } from '../../repos/snapshots';
import { fixtureProvenance } from './fixture-provenance';
import { hashSnapshotId } from './link-state';
import { measurementSummaries } from './measurement-summaries';
import { snapshotSummary } from './snapshot-views';

export interface CreateSnapshot {
  workspaceId: string;
  scenarioId: string;
  notes: string;
  expiresAt: Date | null;
  author: UserRow;
  ip: string | null;
}

/**
 * Freezes a scenario's current stored revision: validates the stored document, computes the result
 * on the server (never taking figures from the request), and copies the fixture provenance and
 * measurement summaries as plain data, and the sensitivity settings kept with the scenario (seed
 * included) so a reader can rerun the same uncertainty draws. The id is a 21-character nanoid from the platform's secure random source.
 */
export async function createSnapshot(m: Models, c: CreateSnapshot): Promise<SnapshotSummary> {
  const row = await findScenarioRow(m, c.workspaceId, c.scenarioId);
  if (!row) throw new AppError('not_found', 'There is no such scenario in this workspace.');
  const checked = parseScenario(JSON.parse(row.document));
  if (!checked.ok) throw new AppError('conflict', 'The stored scenario does not pass the current checks; fix the fields named, save, then share.', checked.problems);
  const scenario = checked.value;
  const result = computeScenario(scenario);
  const inputHash = scenarioHash(scenario);
  if (result.inputHash !== inputHash) throw new Error('the result was computed from other inputs than the snapshot stores');
  const library = new Map((await listFixtureRows(m, c.workspaceId)).map((f) => [String(f.key), f]));
  const fixtures = fixtureProvenance(library, scenario);
  const measurements = await measurementSummaries(m, c.workspaceId, library, scenario.options.map((o) => o.id));
  const { settings } = await findAnalysis(m, row.id);
  const id = nanoid();
  const created = await m.sequelize.transaction(async (t) => {
    const snapshot = await insertSnapshot(
      m,
      {
        id,
        workspaceId: c.workspaceId,
        scenarioId: row.id,
        scenarioRevision: row.revision,
        title: scenario.title,
        canonicalInput: canonicalScenarioJson(scenario),
        inputHash,
        engineVersion: ENGINE_VERSION,
        result: JSON.stringify(result),
        fixtures: JSON.stringify(fixtures),
        measurements: JSON.stringify(measurements),
        analysis: settings ? JSON.stringify(settings) : null,
        notes: c.notes,
        createdBy: c.author.id,
        createdByName: c.author.name,
      },
      { idHash: hashSnapshotId(id), expiresAt: c.expiresAt },
      t,
    );
    await recordAudit(m, { action: 'snapshot_published', actorUserId: c.author.id, workspaceId: c.workspaceId, target: id, ip: c.ip, details: { scenarioId: row.id, revision: row.revision } }, t);
    return snapshot;
  });
  return snapshotSummary(created, { expiresAt: c.expiresAt, revokedAt: null });
}
