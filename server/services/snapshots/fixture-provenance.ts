import canonicalize from 'canonicalize';
import { optionFromFixture } from '../../../src/contracts/api/fixtures';
import type { FixtureFields } from '../../../src/contracts/api/fixtures';
import type { SnapshotFixture } from '../../../src/contracts/api/snapshots';
import { optionSchema } from '../../../src/contracts/scenario';
import type { Scenario } from '../../../src/contracts/scenario';
import type { FixtureRow } from '../../db/models/library';
import { fixtureView } from '../../repos/fixtures';

/** The library entry fields that make up a scenario option (and its provenance), nothing else. */
function entryFields(row: FixtureRow): FixtureFields {
  const f = fixtureView(row, '');
  return {
    key: f.key, label: f.label, technology: f.technology, wallWatts: f.wallWatts, photonEfficacy: f.photonEfficacy, ppf: f.ppf,
    owned: f.owned, fixturePrice: f.fixturePrice, installPrice: f.installPrice, rebate: f.rebate, lamp: f.lamp,
    outputAtHorizonPct: f.outputAtHorizonPct, spectrum: f.spectrum, dataSource: f.dataSource, notes: f.notes,
  };
}

/**
 * Copies, for every option of the scenario, where its figures came from: the library entry with the
 * option's id (its data source, notes and last change) and whether the option still has the
 * entry's figures. The copy is plain data, so later library edits do not reach the snapshot.
 */
export function fixtureProvenance(library: ReadonlyMap<string, FixtureRow>, scenario: Scenario): SnapshotFixture[] {
  return scenario.options.map((option) => {
    const row = library.get(option.id);
    if (!row) {
      return { optionId: option.id, label: option.label, technology: option.technology, dataSource: null, libraryNotes: '', matchesLibrary: false, libraryUpdatedAt: null };
    }
    const fields = entryFields(row);
    const asOption = optionSchema.safeParse(optionFromFixture(fields));
    return {
      optionId: option.id,
      label: option.label,
      technology: option.technology,
      dataSource: fields.dataSource,
      libraryNotes: fields.notes,
      matchesLibrary: asOption.success && canonicalize(asOption.data) === canonicalize(option),
      libraryUpdatedAt: row.updatedAt.toISOString(),
    };
  });
}
