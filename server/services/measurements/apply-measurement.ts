import { fixtureFieldsSchema } from '../../../src/contracts/api/fixtures';
import { fixtureEfficacyFromCanopy } from '../../../src/engine';
import { as } from '../../../src/engine/units';
import type { Fraction, MicromolePerJoule } from '../../../src/engine/units';
import type { Fixture } from '../../../src/contracts/api/fixtures';
import type { Measurement } from '../../../src/contracts/api/measurements';
import { check } from '../../../src/contracts/problems';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { findFixtureRow, fixtureViews, replaceFixture } from '../../repos/fixtures';
import { findMeasurementHead, linkFixtureToMeasurement, setMeasurementFixture } from '../../repos/measurements';
import { unflatten } from '../fixtures/flat-fixture';
import { measurementView } from './measurement-view';
import { readStoredSummary } from './stored-summary';
import type { StoredSummary } from './stored-summary';

/**
 * The fixture fields a measurement sets: from a grid, the fixture's efficacy (the efficacy at the
 * canopy over the share of its photons that landed on the measured area); from a spectrum, the
 * spectrum summary.
 */
function measuredFields(summary: StoredSummary, shareOnArea: number): Record<string, unknown> {
  if (summary.grid) {
    const efficacy = summary.grid.efficacyAtCanopy;
    if (efficacy === undefined) {
      throw new AppError('invalid_input', 'This grid has no efficacy at the canopy to give: upload it again with the area it covers and the wall watts.', [
        { path: '(measurement)', message: 'needs areaM2 and wallWatts to give an efficacy at the canopy' },
      ]);
    }
    return { photonEfficacy: fixtureEfficacyFromCanopy(as<MicromolePerJoule>(efficacy), as<Fraction>(shareOnArea)), ppf: undefined };
  }
  if (!summary.spectrum) throw new Error('a stored summary holds neither a grid nor a spectrum');
  const { blue, green, red, farRed } = summary.spectrum.sharesPct;
  const cctK = summary.spectrum.cctK;
  return { spectrum: { bluePct: blue, greenPct: green, redPct: red, farRedPct: farRed, ...(cctK === null ? {} : { cctK }) } };
}

/**
 * Sets a library fixture's figures from a measurement (a grid's efficacy at the canopy replaces its
 * photonEfficacy or ppf; a spectrum replaces its spectrum summary), marks them `measured` and links
 * the fixture to the measurement. The entry is checked as a whole first; nothing changes when it fails.
 */
export async function applyMeasurement(
  m: Models,
  workspaceId: string,
  measurementId: string,
  fixtureId: string | undefined,
  userId: string,
  shareOnArea = 1,
): Promise<{ fixture: Fixture; measurement: Measurement }> {
  return m.sequelize.transaction(async (transaction) => {
    const head = await findMeasurementHead(m, workspaceId, measurementId, transaction);
    if (!head) throw new AppError('not_found', 'There is no such measurement in this workspace.');
    const target = fixtureId ?? head.fixtureId;
    if (!target) throw new AppError('invalid_input', 'Name the fixture to set.', [{ path: 'fixtureId', message: 'is required: this measurement names no fixture' }]);
    const row = await findFixtureRow(m, workspaceId, target, transaction);
    if (!row) throw new AppError('invalid_input', 'The fixture is not in this workspace.', [{ path: 'fixtureId', message: 'there is no such fixture in this workspace' }]);

    const merged: Record<string, unknown> = { ...unflatten(row), ...measuredFields(readStoredSummary(head.summary), shareOnArea), dataSource: 'measured' };
    const checked = check(fixtureFieldsSchema, merged);
    if (!checked.ok) throw new AppError('invalid_input', 'The fixture would not be valid with these measured figures.', checked.problems);

    await replaceFixture(m, row.id, checked.value, userId, transaction);
    await linkFixtureToMeasurement(m, row.id, head.id, transaction);
    if (head.fixtureId === null) await setMeasurementFixture(m, head.id, row.id, transaction);
    const saved = await findFixtureRow(m, workspaceId, row.id, transaction);
    if (!saved) throw new Error('fixture vanished while applying a measurement');
    const [fixture] = await fixtureViews(m, [saved], transaction);
    if (!fixture) throw new Error('fixture view missing');
    const measurement = await measurementView(m, { ...head, fixtureId: head.fixtureId ?? row.id }, transaction);
    return { fixture, measurement };
  });
}
