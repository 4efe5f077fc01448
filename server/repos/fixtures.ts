import { nanoid } from 'nanoid';
import type { Transaction } from 'sequelize';
import { fixtureSchema } from '../../src/contracts/api/fixtures';
import type { Fixture, FixtureFields } from '../../src/contracts/api/fixtures';
import type { Models } from '../db/models';
import type { FixtureRow } from '../db/models/library';
import { flatten, unflatten } from '../services/fixtures/flat-fixture';
import { userNames } from './users';

/** Turns a stored row into the API's shape; the stored values were checked on the way in. */
export function fixtureView(row: FixtureRow, updatedByName: string): Fixture {
  const fields = unflatten(row);
  return fixtureSchema.parse({
    ...fields,
    id: row.id,
    workspaceId: row.workspaceId,
    measurementId: row.measurementId ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: { id: row.updatedBy, name: updatedByName },
  });
}

/** Rows to API objects with the editors' names. */
export async function fixtureViews(m: Models, rows: FixtureRow[], transaction?: Transaction): Promise<Fixture[]> {
  const byId = await userNames(m, rows.map((r) => r.updatedBy), transaction);
  return rows.map((r) => fixtureView(r, byId.get(r.updatedBy) ?? ''));
}

/** The whole library of a workspace, by label. */
export async function listFixtureRows(m: Models, workspaceId: string, transaction?: Transaction): Promise<FixtureRow[]> {
  const rows = await m.Fixture.findAll({ where: { workspaceId }, order: [['label', 'ASC'], ['id', 'ASC']], transaction });
  return rows.map((r) => r.get({ plain: true }));
}

export async function findFixtureRow(m: Models, workspaceId: string, id: string, transaction?: Transaction): Promise<FixtureRow | null> {
  const row = await m.Fixture.findOne({ where: { workspaceId, id }, transaction });
  return row ? row.get({ plain: true }) : null;
}

export async function findFixtureByKey(m: Models, workspaceId: string, key: string, transaction?: Transaction): Promise<FixtureRow | null> {
  const row = await m.Fixture.findOne({ where: { workspaceId, key }, transaction });
  return row ? row.get({ plain: true }) : null;
}

export async function insertFixture(m: Models, workspaceId: string, f: FixtureFields, userId: string, transaction?: Transaction): Promise<FixtureRow> {
  const row = await m.Fixture.create({ id: nanoid(), workspaceId, ...flatten(f), updatedBy: userId }, { transaction });
  return row.get({ plain: true });
}

export async function replaceFixture(m: Models, id: string, f: FixtureFields, userId: string, transaction?: Transaction): Promise<FixtureRow> {
  await m.Fixture.update({ ...flatten(f), updatedBy: userId }, { where: { id }, transaction });
  const row = await m.Fixture.findByPk(id, { transaction });
  if (!row) throw new Error('fixture vanished while updating');
  return row.get({ plain: true });
}

export async function deleteFixtureRow(m: Models, id: string, transaction?: Transaction): Promise<void> {
  await m.Fixture.destroy({ where: { id }, transaction });
}
