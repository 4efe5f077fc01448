import { QueryTypes } from 'sequelize';
import type { Transaction } from 'sequelize';
import { analysisSettingsSchema } from '../../src/contracts/api/analysis';
import type { AnalysisResponse, AnalysisSettings } from '../../src/contracts/api/analysis';
import type { Models } from '../db/models';

/** The analysis settings kept with a scenario, or nulls when none were saved (or they no longer parse). */
export async function findAnalysis(m: Models, scenarioId: string): Promise<AnalysisResponse> {
  const [row] = await m.sequelize.query<{ settings: string; updated_at: string | Date }>(
    'SELECT settings, updated_at FROM scenario_analysis WHERE scenario_id = :scenarioId',
    { replacements: { scenarioId }, type: QueryTypes.SELECT },
  );
  if (!row) return { settings: null, updatedAt: null };
  const parsed = analysisSettingsSchema.safeParse(JSON.parse(row.settings));
  return { settings: parsed.success ? parsed.data : null, updatedAt: new Date(row.updated_at).toISOString() };
}

/** Keeps the settings with the scenario, replacing what was there (one row per scenario). */
export async function saveAnalysis(m: Models, scenarioId: string, settings: AnalysisSettings, userId: string, transaction?: Transaction): Promise<AnalysisResponse> {
  const now = new Date();
  await m.sequelize.query(
    `INSERT INTO scenario_analysis (scenario_id, settings, updated_by, updated_at) VALUES (:scenarioId, :settings, :userId, :now)
     ON CONFLICT (scenario_id) DO UPDATE SET settings = excluded.settings, updated_by = excluded.updated_by, updated_at = excluded.updated_at`,
    { replacements: { scenarioId, settings: JSON.stringify(settings), userId, now }, transaction },
  );
  return { settings, updatedAt: now.toISOString() };
}

/**
 * Gives a new scenario the settings kept with another, as stored (seed included), so the copy
 * reruns the same draws. One INSERT … SELECT: nothing is written when the source kept none.
 */
export async function copyAnalysis(m: Models, fromScenarioId: string, toScenarioId: string, userId: string, transaction: Transaction): Promise<void> {
  await m.sequelize.query(
    `INSERT INTO scenario_analysis (scenario_id, settings, updated_by, updated_at)
     SELECT :toScenarioId, settings, :userId, :now FROM scenario_analysis WHERE scenario_id = :fromScenarioId`,
    { replacements: { fromScenarioId, toScenarioId, userId, now: new Date() }, transaction },
  );
}
