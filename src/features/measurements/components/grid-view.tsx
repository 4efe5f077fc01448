import type { GridDocumentWire, MeasurementData } from '../../../contracts/api/measurements';
import { formatNumber } from '../../../lib/format';
import { FigureList } from './figure-list';
import { Notice } from '../../../components/ui/notice';
import { cellName, HeatMap } from './heat-map';
import { LazyDetails } from './lazy-details';

/** Largest grid drawn cell by cell; a browser slows down past some tens of thousands of SVG shapes. */
const MAX_DRAWN_CELLS = 40_000;

const pct = (f: number) => `${formatNumber(f * 100, 1)} %`;

/** A PPFD grid's figures, its heat map and every reading in a table. */
export function GridView({ grid, data, areaM2, wallWatts }: { grid: GridDocumentWire; data: MeasurementData; areaM2: number | null; wallWatts: number | null }) {
  const cells = data.cells ?? [];
  const items = [
    { name: 'Mean PPFD', value: `${formatNumber(grid.mean, 1)} µmol m⁻² s⁻¹`, note: `${grid.count} readings, ${grid.rows} × ${grid.cols}` },
    { name: 'Lowest reading', value: `${formatNumber(grid.min, 1)} µmol m⁻² s⁻¹` },
    { name: 'Highest reading', value: `${formatNumber(grid.max, 1)} µmol m⁻² s⁻¹` },
    { name: 'Uniformity, min/mean', value: formatNumber(grid.minOverMean, 3), note: 'lowest reading ÷ mean' },
    { name: 'Uniformity, min/max', value: formatNumber(grid.minOverMax, 3), note: 'lowest reading ÷ highest' },
    { name: 'Coefficient of variation', value: `${formatNumber(grid.cv, 4)} (${pct(grid.cv)})`, note: 'population standard deviation ÷ mean (every point of the canopy counted once, dividing by n)' },
    {
      name: 'Canopy photon flux',
      value: grid.canopyFlux === undefined ? 'not given' : `${formatNumber(grid.canopyFlux, 0)} µmol/s`,
      note: grid.canopyFlux === undefined ? 'needs the area the grid covers' : `mean PPFD × ${formatNumber(areaM2 ?? 0, 2)} m²`,
    },
    {
      name: 'Efficacy at the canopy',
      value: grid.efficacyAtCanopy === undefined ? 'not given' : `${formatNumber(grid.efficacyAtCanopy, 2)} µmol/J`,
      note: grid.efficacyAtCanopy === undefined ? 'needs the area and the wall watts' : `canopy photon flux ÷ ${formatNumber(wallWatts ?? 0, 0)} W at the wall`,
    },
  ];
  return (
    <div className="space-y-4">
      <FigureList items={items} label="Figures of the grid" />
      <p className="max-w-3xl text-sm text-ink-soft">
        Efficacy at the canopy counts only the photons that land on the measured area, per joule drawn at the wall. Light lost to walls and
        aisles, and any part of the canopy the grid does not cover, are left out, so it is usually below the photon efficacy on a datasheet,
        which counts every photon the fixture emits.
      </p>
      {grid.count <= MAX_DRAWN_CELLS ? (
        <HeatMap cells={cells} xM={data.xM} yM={data.yM} min={grid.min} max={grid.max} mean={grid.mean} />
      ) : (
        <Notice tone="info">This grid has {formatNumber(grid.count, 0)} readings, too many to draw one by one here; the table below holds them all.</Notice>
      )}
      <LazyDetails className="text-sm" summary="Every reading as a table (µmol m⁻² s⁻¹)">
        {() => (
        <div className="mt-1 max-h-96 overflow-auto">
          <table className="border-collapse" aria-label="Readings of the grid">
            <thead>
              <tr className="text-right text-ink-soft">
                <th scope="col" className="px-2 font-medium" />
                {(cells[0] ?? []).map((_, c) => <th key={c} scope="col" className="px-2 font-medium">{data.xM ? `x ${data.xM[c]} m` : `col ${c + 1}`}</th>)}
              </tr>
            </thead>
            <tbody>
              {cells.map((row, r) => (
                <tr key={r} className="border-t border-line text-right">
                  <th scope="row" className="px-2 text-left font-medium text-ink-soft">{data.yM ? `y ${data.yM[r]} m` : `row ${r + 1}`}</th>
                  {row.map((v, c) => <td key={c} className="figure px-2" title={cellName(r, c, data.xM, data.yM)}>{formatNumber(v, 1)}</td>)}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        )}
      </LazyDetails>
    </div>
  );
}
