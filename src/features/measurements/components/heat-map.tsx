import { formatNumber } from '../../../lib/format';
import { colourAt, haloOn, scalePosition, textOn } from '../lib/colour-scale';
import { ScaleLegend } from './scale-legend';

/** What the heat map draws: readings[row][column] in µmol m⁻² s⁻¹, with positions in metres when the file gave them. */
export interface HeatMapProps {
  cells: number[][];
  xM: number[] | null;
  yM: number[] | null;
  min: number;
  max: number;
  mean: number;
}

const CELL = 48;
const MARGIN = { left: 56, top: 8, bottom: 36 };

/** Where a cell is, in words, for its hover text and the table. */
export function cellName(r: number, c: number, xM: number[] | null, yM: number[] | null): string {
  return xM && yM ? `x ${xM[c]} m, y ${yM[r]} m` : `row ${r + 1}, column ${c + 1}`;
}

/**
 * The grid as coloured cells (our own scale: dark is little light, pale is much), each with its
 * reading on hover and, when the cells are large enough, written in. A matrix file is drawn as it
 * reads (line 1 at the top); an x, y file as a plan with y rising upwards.
 */
export function HeatMap({ cells, xM, yM, min, max, mean }: HeatMapProps) {
  const rows = cells.length;
  const cols = cells[0]?.length ?? 0;
  const width = MARGIN.left + cols * CELL;
  const height = MARGIN.top + rows * CELL + MARGIN.bottom;
  const showValues = cols <= 14;
  const yOf = (r: number) => MARGIN.top + (yM ? rows - 1 - r : r) * CELL;
  const every = (n: number) => Math.max(1, Math.ceil(n / 12));
  return (
    <figure className="space-y-2">
      <svg viewBox={`0 0 ${width} ${height}`} className="h-auto w-full max-w-3xl" role="img" aria-label={`Heat map of ${rows} × ${cols} PPFD readings from ${formatNumber(min, 0)} to ${formatNumber(max, 0)} µmol m⁻² s⁻¹`} data-testid="heat-map">
        {cells.map((row, r) =>
          row.map((v, c) => {
            const t = scalePosition(v, min, max);
            return (
              <g key={`${r}-${c}`}>
                <rect x={MARGIN.left + c * CELL} y={yOf(r)} width={CELL} height={CELL} fill={colourAt(t)} stroke="#f7f5ef" strokeWidth={1}>
                  <title>{`${cellName(r, c, xM, yM)}: ${formatNumber(v, 1)} µmol m⁻² s⁻¹`}</title>
                </rect>
                {showValues ? (
                  <text x={MARGIN.left + c * CELL + CELL / 2} y={yOf(r) + CELL / 2} dy="0.35em" textAnchor="middle" fontSize={cols > 10 ? 10 : 12} fill={textOn(t)} stroke={haloOn(t)} strokeWidth={1.6} paintOrder="stroke" pointerEvents="none">
                    {formatNumber(v, 0)}
                  </text>
                ) : null}
              </g>
            );
          }),
        )}
        {Array.from({ length: rows }, (_, r) => r).filter((r) => r % every(rows) === 0).map((r) => (
          <text key={`ry${r}`} x={MARGIN.left - 6} y={yOf(r) + CELL / 2} dy="0.35em" textAnchor="end" fontSize={11} fill="#4b5759">
            {yM ? `${yM[r]} m` : `row ${r + 1}`}
          </text>
        ))}
        {Array.from({ length: cols }, (_, c) => c).filter((c) => c % every(cols) === 0).map((c) => (
          <text key={`cx${c}`} x={MARGIN.left + c * CELL + CELL / 2} y={MARGIN.top + rows * CELL + 16} textAnchor="middle" fontSize={11} fill="#4b5759">
            {xM ? `${xM[c]} m` : c + 1}
          </text>
        ))}
        <text x={MARGIN.left + (cols * CELL) / 2} y={height - 4} textAnchor="middle" fontSize={11} fill="#4b5759">{xM ? 'x' : 'column'}</text>
      </svg>
      <ScaleLegend min={min} max={max} mean={mean} />
      <figcaption className="text-sm text-ink-soft">Point at a cell to read its value; the table below holds every reading.</figcaption>
    </figure>
  );
}
