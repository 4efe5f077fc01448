import { nanoid } from 'nanoid';
import { Op } from 'sequelize';
import type { Transaction } from 'sequelize';
import type { Scenario } from '../../src/contracts/scenario';
import type { RevisionSummary, ScenarioRecord, ScenarioSummary } from '../../src/contracts/api/scenarios';
import { modelReader, readRow } from '../db/direct-read';
import type { Models } from '../db/models';
import type { RevisionRow, ScenarioRow } from '../db/models/library';
import { contains } from './like';
import { userNames } from './users';

export type RevisionAction = RevisionSummary['action'];

export async function findScenarioRow(m: Models, workspaceId: string, id: string, transaction?: Transaction): Promise<ScenarioRow | null> {
  if (!transaction) {
    // The most frequent read of a working session (open, result, revisions): plain SQL (see server/db/direct-read.ts).
    const scenarios = modelReader(m.Scenario, 's');
    const raw = await readRow<Record<string, unknown>>(
      m.sequelize,
      `SELECT ${scenarios.columns} FROM scenarios s WHERE s.workspace_id = ? AND s.id = ? AND s.deleted_at IS NULL`,
      [workspaceId, id],
    );
    return raw ? scenarios.toRow(raw) : null;
  }
  const row = await m.Scenario.findOne({ where: { workspaceId, id, deletedAt: null }, transaction });
  return row ? row.get({ plain: true }) : null;
}

export async function scenarioRecord(m: Models, row: ScenarioRow, transaction?: Transaction): Promise<ScenarioRecord> {
  const names = await userNames(m, [row.updatedBy], transaction);
  return {
    id: row.id,
    workspaceId: row.workspaceId,
    title: row.title,
    document: JSON.parse(row.document) as Scenario,
    revision: row.revision,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: { id: row.updatedBy, name: names.get(row.updatedBy) ?? '' },
  };
}

/** One page of a workspace's scenarios, newest change first; `q` matches the title. */
export async function listScenarios(m: Models, workspaceId: string, q: string | undefined, page: number, pageSize: number): Promise<{ items: ScenarioSummary[]; total: number }> {
  const where = { [Op.and]: [{ workspaceId, deletedAt: null }, ...(q ? [contains(m.sequelize, 'title', q)] : [])] };
  const { rows, count } = await m.Scenario.findAndCountAll({ where, order: [['updatedAt', 'DESC'], ['id', 'ASC']], limit: pageSize, offset: (page - 1) * pageSize });
  const plain = rows.map((r) => r.get({ plain: true }));
  const names = await userNames(m, plain.map((r) => r.updatedBy));
  return {
    total: count,
    items: plain.map((r) => ({
      id: r.id,
      workspaceId: r.workspaceId,
      title: r.title,
      revision: r.revision,
      createdAt: r.createdAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
      updatedBy: { id: r.updatedBy, name: names.get(r.updatedBy) ?? '' },
      optionCount: (JSON.parse(r.document) as Scenario).options.length,
    })),
  };
}

export interface RevisionInput {
  scenarioId: string;
  revision: number;
  document: Scenario;
  action: RevisionAction;
  changedPaths: string[];
  fromRevision: number | null;
  userId: string;
}

/** Appends one revision; revisions are never changed afterwards. */
export async function appendRevision(m: Models, r: RevisionInput, transaction: Transaction): Promise<void> {
  await m.Revision.create(
    {
      scenarioId: r.scenarioId,
      revision: r.revision,
      title: r.document.title,
      document: JSON.stringify(r.document),
      action: r.action,
      changedPaths: JSON.stringify(r.changedPaths),
      fromRevision: r.fromRevision,
      createdBy: r.userId,
    },
    { transaction },
  );
}

/** Creates a scenario at revision 1 together with its first revision. */
export async function insertScenario(
  m: Models,
  workspaceId: string,
  document: Scenario,
  userId: string,
  origin: { action: RevisionAction; fromRevision: number | null },
  transaction: Transaction,
): Promise<ScenarioRow> {
  const row = await m.Scenario.create(
    { id: nanoid(), workspaceId, title: document.title, document: JSON.stringify(document), revision: 1, updatedBy: userId },
    { transaction },
  );
  const plain = row.get({ plain: true });
  await appendRevision(m, { scenarioId: plain.id, revision: 1, document, action: origin.action, changedPaths: [], fromRevision: origin.fromRevision, userId }, transaction);
  return plain;
}

/**
 * Stores a new document if the scenario is still at `expectedRevision`; the revision check is in
 * the UPDATE's WHERE clause, so two saves from the same revision cannot both succeed.
 * @returns the new row, or null when the revision had moved on
 */
export async function advanceScenario(
  m: Models,
  row: ScenarioRow,
  expectedRevision: number,
  document: Scenario,
  userId: string,
  transaction: Transaction,
): Promise<ScenarioRow | null> {
  const [changed] = await m.Scenario.update(
    { title: document.title, document: JSON.stringify(document), revision: expectedRevision + 1, updatedBy: userId },
    { where: { id: row.id, revision: expectedRevision, deletedAt: null }, transaction },
  );
  if (changed !== 1) return null;
  const next = await m.Scenario.findByPk(row.id, { transaction });
  return next ? next.get({ plain: true }) : null;
}

export async function softDeleteScenario(m: Models, id: string, transaction?: Transaction): Promise<void> {
  await m.Scenario.update({ deletedAt: new Date() }, { where: { id }, transaction });
}

function revisionSummary(r: RevisionRow, name: string): RevisionSummary {
  return {
    revision: r.revision,
    title: r.title,
    action: r.action as RevisionAction,
    changedPaths: JSON.parse(r.changedPaths) as string[],
    fromRevision: r.fromRevision,
    createdAt: r.createdAt.toISOString(),
    createdBy: { id: r.createdBy, name },
  };
}

/** A scenario's history, newest first. */
export async function listRevisions(m: Models, scenarioId: string): Promise<RevisionSummary[]> {
  const rows = (await m.Revision.findAll({ where: { scenarioId }, order: [['revision', 'DESC']] })).map((r) => r.get({ plain: true }));
  const names = await userNames(m, rows.map((r) => r.createdBy));
  return rows.map((r) => revisionSummary(r, names.get(r.createdBy) ?? ''));
}

/** One revision with its document. */
export async function findRevision(m: Models, scenarioId: string, revision: number, transaction?: Transaction): Promise<(RevisionSummary & { document: Scenario }) | null> {
  const row = await m.Revision.findOne({ where: { scenarioId, revision }, transaction });
  if (!row) return null;
  const r = row.get({ plain: true });
  const names = await userNames(m, [r.createdBy], transaction);
  return { ...revisionSummary(r, names.get(r.createdBy) ?? ''), document: JSON.parse(r.document) as Scenario };
}
