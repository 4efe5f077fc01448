import { nanoid } from 'nanoid';
import { Op, QueryTypes } from 'sequelize';
import type { Transaction } from 'sequelize';
import type { Models } from '../db/models';
import type { MeasurementRow } from '../db/models/measurements';

/** A measurement row without the file's bytes, for lists and views. */
export type MeasurementHead = Omit<MeasurementRow, 'content'>;

/** A library fixture named by a measurement. */
export interface FixtureRef {
  id: string;
  label: string;
}

const HEAD = { exclude: ['content'] };

/** Stores a new measurement with its file; returns it without the bytes. */
export async function insertMeasurement(
  m: Models,
  row: Omit<MeasurementRow, 'id' | 'createdAt' | 'updatedAt'>,
  transaction?: Transaction,
): Promise<MeasurementHead> {
  const made = await m.Measurement.create({ id: nanoid(), ...row }, { transaction });
  const { content: _bytes, ...head } = made.get({ plain: true });
  return head;
}

/** The measurements of a workspace, newest first, without their files. */
export async function listMeasurementHeads(m: Models, workspaceId: string): Promise<MeasurementHead[]> {
  const rows = await m.Measurement.findAll({ where: { workspaceId }, attributes: HEAD, order: [['createdAt', 'DESC'], ['id', 'ASC']] });
  return rows.map((r) => r.get({ plain: true }));
}

/** One measurement of a workspace without its file, or null. */
export async function findMeasurementHead(m: Models, workspaceId: string, id: string, transaction?: Transaction): Promise<MeasurementHead | null> {
  const row = await m.Measurement.findOne({ where: { workspaceId, id }, attributes: HEAD, transaction });
  return row ? row.get({ plain: true }) : null;
}

/** The raw file of a measurement: name, size, SHA-256 and bytes; null when there is no such measurement. */
export async function findMeasurementFile(
  m: Models,
  workspaceId: string,
  id: string,
): Promise<Pick<MeasurementRow, 'fileName' | 'byteSize' | 'sha256' | 'content'> | null> {
  const row = await m.Measurement.findOne({ where: { workspaceId, id }, attributes: ['fileName', 'byteSize', 'sha256', 'content'] });
  return row ? row.get({ plain: true }) : null;
}

export async function setMeasurementFixture(m: Models, id: string, fixtureId: string, transaction?: Transaction): Promise<void> {
  await m.Measurement.update({ fixtureId }, { where: { id }, transaction });
}

export async function deleteMeasurementRow(m: Models, id: string): Promise<void> {
  await m.Measurement.destroy({ where: { id } });
}

/** Points a fixture at the measurement its figures now come from. */
export async function linkFixtureToMeasurement(m: Models, fixtureId: string, measurementId: string, transaction?: Transaction): Promise<void> {
  await m.Fixture.update({ measurementId }, { where: { id: fixtureId }, transaction });
}

/** How many measurements a workspace holds (tests check that a refused file left none behind). */
export async function countMeasurements(m: Models, workspaceId?: string): Promise<number> {
  return m.Measurement.count(workspaceId ? { where: { workspaceId } } : {});
}

/** Names of people, labels of fixtures, and which fixtures each measurement feeds, for a set of measurements. */
export async function measurementLinks(
  m: Models,
  heads: MeasurementHead[],
  transaction?: Transaction,
): Promise<{ names: Map<string, string>; fixtures: Map<string, FixtureRef>; feeds: Map<string, FixtureRef[]> }> {
  const names = new Map<string, string>();
  const fixtures = new Map<string, FixtureRef>();
  const feeds = new Map<string, FixtureRef[]>();
  if (heads.length === 0) return { names, fixtures, feeds };
  const userIds = [...new Set(heads.map((h) => h.createdBy))];
  const users = await m.sequelize.query<{ id: string; name: string }>('SELECT id, name FROM users WHERE id IN (:ids)', {
    replacements: { ids: userIds },
    type: QueryTypes.SELECT,
    transaction,
  });
  for (const u of users) names.set(u.id, u.name);
  const ids = heads.map((h) => h.id);
  const fixtureIds = heads.map((h) => h.fixtureId).filter((f): f is string => f !== null);
  const rows = await m.Fixture.findAll({
    where: { [Op.or]: [{ id: fixtureIds }, { measurementId: ids }] },
    attributes: ['id', 'label', 'measurementId'],
    order: [['label', 'ASC']],
    transaction,
  });
  for (const r of rows.map((x) => x.get({ plain: true }))) {
    fixtures.set(r.id, { id: r.id, label: r.label as string });
    if (r.measurementId) feeds.set(r.measurementId, [...(feeds.get(r.measurementId) ?? []), { id: r.id, label: r.label as string }]);
  }
  return { names, fixtures, feeds };
}
