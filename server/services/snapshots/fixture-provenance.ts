import canonicalize from 'canonicalize';
import { optionFromFixture } from '../../../src/contracts/api/fixtures';
import type { SnapshotFixture } from '../../../src/contracts/api/snapshots';
import { optionSchema } from '../../../src/contracts/scenario';
import type { Scenario } from '../../../src/contracts/scenario';
import type { Models } from '../../db/models';
import { fixtureView, listFixtureRows } from '../../repos/fixtures';

/**
 * Copies, for every option of the scenario, where its figures came from: the library entry with the
 * option's id (its data source, notes and last change) and whether the option still has the
 * entry's figures. The copy is plain data, so later library edits do not reach the snapshot.
 */
export async function fixtureProvenance(m: Models, workspaceId: string, scenario: Scenario): Promise<SnapshotFixture[]> {
  const library = new Map((await listFixtureRows(m, workspaceId)).map((row) => [row.key, row]));
  return scenario.options.map((option) => {
    const row = library.get(option.id);
    if (!row) {
      return { optionId: option.id, label: option.label, technology: option.technology, dataSource: null, libraryNotes: '', matchesLibrary: false, libraryUpdatedAt: null };
    }
    const entry = fixtureView(row, '');
    const { id: _id, workspaceId: _w, createdAt: _c, updatedAt: _u, updatedBy: _b, ...fields } = entry;
    const asOption = optionSchema.safeParse(optionFromFixture(fields));
    const matchesLibrary = asOption.success && canonicalize(asOption.data) === canonicalize(option);
    return {
      optionId: option.id,
      label: option.label,
      technology: option.technology,
      dataSource: entry.dataSource,
      libraryNotes: entry.notes,
      matchesLibrary,
      libraryUpdatedAt: entry.updatedAt,
    };
  });
}
