import type { Measurement, MeasurementData } from '../../../src/contracts/api/measurements';
import { measurementSchema } from '../../../src/contracts/api/measurements';
import type { Transaction } from 'sequelize';
import type { Models } from '../../db/models';
import { measurementLinks } from '../../repos/measurements';
import type { MeasurementHead } from '../../repos/measurements';
import { readStoredSummary } from './stored-summary';

/** Rows to the API's shape, with the uploader's name, the named fixture and the fixtures fed. */
export async function measurementViews(m: Models, heads: MeasurementHead[], transaction?: Transaction): Promise<Measurement[]> {
  const links = await measurementLinks(m, heads, transaction);
  return heads.map((h) => {
    const s = readStoredSummary(h.summary);
    return measurementSchema.parse({
      id: h.id,
      workspaceId: h.workspaceId,
      kind: h.kind,
      label: h.label,
      fileName: h.fileName,
      byteSize: h.byteSize,
      sha256: h.sha256,
      unit: h.unit,
      areaM2: h.areaM2,
      wallWatts: h.wallWatts,
      fixture: h.fixtureId ? (links.fixtures.get(h.fixtureId) ?? null) : null,
      feeds: links.feeds.get(h.id) ?? [],
      grid: s.grid,
      spectrum: s.spectrum,
      notes: s.notes,
      engineVersion: h.engineVersion,
      createdAt: h.createdAt.toISOString(),
      createdBy: { id: h.createdBy, name: links.names.get(h.createdBy) ?? '' },
    });
  });
}

/** One row to the API's shape. */
export async function measurementView(m: Models, head: MeasurementHead, transaction?: Transaction): Promise<Measurement> {
  const [view] = await measurementViews(m, [head], transaction);
  if (!view) throw new Error('measurement view missing');
  return view;
}

/** The grid readings or photon curve stored with a measurement. */
export function measurementData(head: MeasurementHead): MeasurementData {
  return readStoredSummary(head.summary).data;
}
