import type { Scenario } from '../../../src/contracts/scenario';
import type { ScenarioRecord } from '../../../src/contracts/api/scenarios';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { copyAnalysis } from '../../repos/scenario-analysis';
import { advanceScenario, appendRevision, findRevision, findScenarioRow, insertScenario, scenarioRecord } from '../../repos/scenarios';
import type { RevisionAction } from '../../repos/scenarios';
import { changedPaths } from './changed-paths';

function notFound(): AppError {
  return new AppError('not_found', 'There is no such scenario in this workspace.');
}

function stale(current: number, sent: number): AppError {
  return new AppError(
    'conflict',
    `This scenario was saved by someone else meanwhile: you edited revision ${sent}, the current one is ${current}. Reload it and apply your change again.`,
    [{ path: 'revision', message: `current revision is ${current}` }],
  );
}

/** Stores a new scenario at revision 1. */
export async function createScenario(m: Models, workspaceId: string, document: Scenario, userId: string): Promise<ScenarioRecord> {
  // The record (with the author's name) is read after the commit: writes queue behind one another, so a transaction holds only what must be atomic.
  const row = await m.sequelize.transaction((t) => insertScenario(m, workspaceId, document, userId, { action: 'created', fromRevision: null }, t));
  return scenarioRecord(m, row);
}

async function advance(
  m: Models,
  workspaceId: string,
  id: string,
  expected: number | null,
  document: Scenario,
  userId: string,
  action: RevisionAction,
  fromRevision: number | null,
): Promise<ScenarioRecord> {
  const saved = await m.sequelize.transaction(async (t) => {
    const row = await findScenarioRow(m, workspaceId, id, t);
    if (!row) throw notFound();
    const base = expected ?? row.revision;
    if (base !== row.revision) throw stale(row.revision, base);
    const paths = changedPaths(JSON.parse(row.document), document);
    if (paths.length === 0 && action === 'edited') return row;
    const next = await advanceScenario(m, row, base, document, userId, t);
    if (!next) throw stale(row.revision + 1, base);
    await appendRevision(m, { scenarioId: id, revision: next.revision, document, action, changedPaths: paths, fromRevision, userId }, t);
    return next;
  });
  return scenarioRecord(m, saved);
}

/**
 * Saves an edit made from revision `ifMatch`. A stale revision is refused (409 conflict, the
 * current revision in the message and in fields); an edit that changes nothing makes no revision.
 */
export function updateScenario(m: Models, workspaceId: string, id: string, ifMatch: number, document: Scenario, userId: string): Promise<ScenarioRecord> {
  return advance(m, workspaceId, id, ifMatch, document, userId, 'edited', null);
}

/** Makes an old revision's document the current one, as a new revision. */
export async function restoreRevision(m: Models, workspaceId: string, id: string, revision: number, userId: string): Promise<ScenarioRecord> {
  if (!(await findScenarioRow(m, workspaceId, id))) throw notFound();
  const old = await findRevision(m, id, revision);
  if (!old) throw new AppError('not_found', `This scenario has no revision ${revision}.`);
  return advance(m, workspaceId, id, null, old.document, userId, 'restored', revision);
}

/** Copies the current document, and the sensitivity settings kept with it (seed included), into a new scenario in the same workspace. */
export async function duplicateScenario(m: Models, workspaceId: string, id: string, title: string | undefined, userId: string): Promise<ScenarioRecord> {
  const copy = await m.sequelize.transaction(async (t) => {
    const row = await findScenarioRow(m, workspaceId, id, t);
    if (!row) throw notFound();
    const source = JSON.parse(row.document) as Scenario;
    const document: Scenario = { ...source, title: title ?? `${source.title} (copy)`.slice(0, 200) };
    const inserted = await insertScenario(m, workspaceId, document, userId, { action: 'duplicated', fromRevision: row.revision }, t);
    await copyAnalysis(m, row.id, inserted.id, userId, t);
    return inserted;
  });
  return scenarioRecord(m, copy);
}
