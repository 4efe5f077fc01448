import { Op } from 'sequelize';
import type { SnapshotMeasurement } from '../../../src/contracts/api/snapshots';
import type { Models } from '../../db/models';
import type { FixtureRow } from '../../db/models/library';
import { readStoredSummary } from '../measurements/stored-summary';

type Figures = SnapshotMeasurement['figures'];

function figuresOf(summaryJson: string): Figures {
  const s = readStoredSummary(summaryJson);
  if (s.grid) {
    const g = s.grid;
    return {
      'points': g.count,
      'mean PPFD (µmol/m²/s)': g.mean,
      'min PPFD (µmol/m²/s)': g.min,
      'max PPFD (µmol/m²/s)': g.max,
      'min/mean': g.minOverMean,
      'min/max': g.minOverMax,
      'coefficient of variation': g.cv,
      'efficacy at the canopy (µmol/J)': g.efficacyAtCanopy ?? null,
    };
  }
  if (s.spectrum) {
    const p = s.spectrum;
    return {
      'blue share (%)': p.sharesPct.blue,
      'green share (%)': p.sharesPct.green,
      'red share (%)': p.sharesPct.red,
      'far-red share (%)': p.sharesPct.farRed,
      'CCT (K)': p.cctK,
      'YPF/PPF': p.ypfdRatio,
      'red : far-red': p.redFarRedRatio,
    };
  }
  return {};
}

/**
 * Summaries of the measurements that concern the scenario's options, copied as plain figures: those
 * attached to an option's library entry and those an entry's figures were taken from. The raw
 * files stay in the workspace; the snapshot keeps only the figures.
 */
export async function measurementSummaries(m: Models, workspaceId: string, library: ReadonlyMap<string, FixtureRow>, optionIds: string[]): Promise<SnapshotMeasurement[]> {
  const entries = optionIds.flatMap((id) => {
    const row = library.get(id);
    return row ? [{ optionId: id, row }] : [];
  });
  if (entries.length === 0) return [];
  const fixtureIds = entries.map((e) => e.row.id);
  const fedBy = entries.map((e) => e.row.measurementId).filter((x): x is string => Boolean(x));
  const rows = await m.Measurement.findAll({
    where: { workspaceId, [Op.or]: [{ fixtureId: fixtureIds }, { id: fedBy }] },
    attributes: { exclude: ['content'] },
    order: [['createdAt', 'ASC'], ['id', 'ASC']],
  });
  return rows.map((r) => {
    const ms = r.get({ plain: true });
    const owner = entries.find((e) => e.row.id === ms.fixtureId || e.row.measurementId === ms.id);
    return { kind: ms.kind === 'grid' ? 'PPFD grid' : 'spectrum', name: ms.label, optionId: owner?.optionId ?? null, figures: figuresOf(ms.summary), measuredAt: ms.createdAt.toISOString() };
  });
}
