import { analysisSettingsSchema } from '../../../src/contracts/api/analysis';
import type { PublicSnapshot, SnapshotFixture, SnapshotMeasurement, SnapshotSummary } from '../../../src/contracts/api/snapshots';
import type { Scenario } from '../../../src/contracts/scenario';
import type { ScenarioResult } from '../../../src/engine';
import type { SnapshotLinkRow, SnapshotRow } from '../../db/models/snapshots';
import { linkView } from './link-state';

/** A snapshot as its workspace's editors list it. */
export function snapshotSummary(row: SnapshotRow, link: Pick<SnapshotLinkRow, 'expiresAt' | 'revokedAt'>): SnapshotSummary {
  return {
    id: row.id,
    workspaceId: row.workspaceId,
    scenarioId: row.scenarioId,
    scenarioRevision: row.scenarioRevision,
    title: row.title,
    notes: row.notes,
    inputHash: row.inputHash,
    engineVersion: row.engineVersion,
    createdAt: row.createdAt.toISOString(),
    createdBy: { id: row.createdBy, name: row.createdByName },
    link: linkView(link),
  };
}

/** The settings frozen with a snapshot, when there are any that still parse. */
function frozenAnalysis(row: SnapshotRow): Pick<PublicSnapshot, 'analysis'> {
  if (row.analysis === null || row.analysis === undefined) return {};
  const parsed = analysisSettingsSchema.safeParse(JSON.parse(row.analysis));
  return parsed.success ? { analysis: parsed.data } : {};
}

/** The immutable public part of a snapshot, from its stored columns only. */
export function publicSnapshot(row: SnapshotRow): PublicSnapshot {
  return {
    id: row.id,
    title: row.title,
    createdAt: row.createdAt.toISOString(),
    publishedBy: row.createdByName,
    scenario: JSON.parse(row.canonicalInput) as Scenario,
    notes: row.notes,
    fixtures: JSON.parse(row.fixtures) as SnapshotFixture[],
    measurements: JSON.parse(row.measurements) as SnapshotMeasurement[],
    result: JSON.parse(row.result) as ScenarioResult,
    engineVersion: row.engineVersion,
    inputHash: row.inputHash,
    ...frozenAnalysis(row),
  };
}
