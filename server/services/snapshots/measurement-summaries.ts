import { QueryTypes } from 'sequelize';
import type { SnapshotMeasurement } from '../../../src/contracts/api/snapshots';
import type { Models } from '../../db/models';

async function hasMeasurementsTable(m: Models): Promise<boolean> {
  const found = await m.sequelize.query<{ name: string }>("SELECT name FROM sqlite_master WHERE type = 'table' AND name = 'measurements'", { type: QueryTypes.SELECT });
  return found.length > 0;
}

/**
 * Summaries of the measurements linked to the scenario's options, copied as plain figures. The
 * product does not store measurements yet (no `measurements` table), so the list is empty then.
 */
export async function measurementSummaries(m: Models): Promise<SnapshotMeasurement[]> {
  if (!(await hasMeasurementsTable(m))) return [];
  return [];
}
