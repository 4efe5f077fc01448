import { as } from '../units';
import type { Ppfd } from '../units';
import { DEFAULT_MAX_BYTES, notANumber, numberCell, readCsvRows } from './csv-rows';
import type { CsvRow } from './csv-rows';
import { fileProblem, lineProblem, refused } from './file-problems';
import type { FileChecked, FileProblem } from './file-problems';

/** PPFD readings over a canopy: values[row][column], µmol m⁻² s⁻¹. */
export interface PpfdGrid {
  rows: number;
  cols: number;
  values: Ppfd[][];
  /** Positions of the columns (x) and rows (y) in metres, ascending; null for a bare matrix. */
  xM: number[] | null;
  yM: number[] | null;
}

/** Options of the measurement file readers. */
export interface ReadOptions {
  /** Largest accepted file, bytes of UTF-8; default 2 MB (2,000,000 bytes). */
  maxBytes?: number;
}

const HEADER_COLUMNS = ['x', 'y', 'ppfd'] as const;

/** `ppfd (µmol m-2 s-1)` and `x [m]` name the columns ppfd and x. */
const columnName = (cell: string) => cell.replace(/[([].*$/, '').trim().toLowerCase();

function readingProblem(row: CsvRow, column: number, cell: string): FileProblem | number {
  const value = numberCell(cell);
  if (value === null) return lineProblem(row.line, notANumber(column, cell));
  if (value < 0) return lineProblem(row.line, `column ${column}: ${cell} is negative; a PPFD reading is 0 or more`);
  return value;
}

function readMatrix(rows: CsvRow[], problems: FileProblem[]): PpfdGrid {
  const cols = rows[0]?.cells.length ?? 0;
  const values: Ppfd[][] = [];
  for (const row of rows) {
    if (row.cells.length !== cols) {
      problems.push(lineProblem(row.line, `has ${row.cells.length} values; line ${rows[0]?.line} has ${cols} (every canopy row needs the same count)`));
      continue;
    }
    values.push(
      row.cells.map((cell, i) => {
        const read = readingProblem(row, i + 1, cell);
        if (typeof read === 'number') return as<Ppfd>(read);
        problems.push(read);
        return as<Ppfd>(0);
      }),
    );
  }
  return { rows: values.length, cols, values, xM: null, yM: null };
}

function readPoints(header: CsvRow, rows: CsvRow[], problems: FileProblem[]): PpfdGrid | null {
  const names = header.cells.map(columnName);
  const index = HEADER_COLUMNS.map((c) => names.indexOf(c));
  const extra = names.filter((n) => !(HEADER_COLUMNS as readonly string[]).includes(n));
  if (index.some((i) => i < 0) || extra.length > 0 || names.length !== 3) {
    problems.push(lineProblem(header.line, `the header must name exactly the columns x, y and ppfd (found ${header.cells.map((c) => `"${c}"`).join(', ')})`));
    return null;
  }
  if (rows.length === 0) problems.push(lineProblem(header.line, 'no readings follow the header'));
  const seen = new Map<string, number>();
  const points: { x: number; y: number; ppfd: number }[] = [];
  for (const row of rows) {
    if (row.cells.length !== 3) {
      problems.push(lineProblem(row.line, `has ${row.cells.length} values; the header has 3 (x, y, ppfd)`));
      continue;
    }
    const [xi, yi, pi] = index as [number, number, number];
    const x = numberCell(row.cells[xi] ?? '');
    const y = numberCell(row.cells[yi] ?? '');
    const ppfd = readingProblem(row, pi + 1, row.cells[pi] ?? '');
    if (x === null) problems.push(lineProblem(row.line, notANumber(xi + 1, row.cells[xi] ?? '')));
    if (y === null) problems.push(lineProblem(row.line, notANumber(yi + 1, row.cells[yi] ?? '')));
    if (typeof ppfd !== 'number') problems.push(ppfd);
    if (x === null || y === null || typeof ppfd !== 'number') continue;
    const key = `${x},${y}`;
    const earlier = seen.get(key);
    if (earlier !== undefined) problems.push(lineProblem(row.line, `x ${x}, y ${y} was already given on line ${earlier}`));
    else seen.set(key, row.line);
    points.push({ x, y, ppfd });
  }
  const xM = [...new Set(points.map((p) => p.x))].sort((a, b) => a - b);
  const yM = [...new Set(points.map((p) => p.y))].sort((a, b) => a - b);
  const values: Ppfd[][] = yM.map(() => xM.map(() => as<Ppfd>(Number.NaN)));
  const col = new Map(xM.map((x, i) => [x, i]));
  const rowOf = new Map(yM.map((y, i) => [y, i]));
  for (const p of points) values[rowOf.get(p.y) ?? 0]![col.get(p.x) ?? 0] = as<Ppfd>(p.ppfd);
  const missing: string[] = [];
  yM.forEach((y, r) => xM.forEach((x, c) => Number.isNaN(values[r]?.[c]) && missing.push(`x ${x}, y ${y}`)));
  if (missing.length > 0 && problems.length === 0) {
    const shown = missing.slice(0, 5).join('; ') + (missing.length > 5 ? `; and ${missing.length - 5} more` : '');
    problems.push(fileProblem(`the points do not fill a rectangular grid: no reading at ${shown}`));
  }
  return { rows: yM.length, cols: xM.length, values, xM, yM };
}

/**
 * Reads a PPFD grid from CSV text: either a matrix of readings (one canopy row per line, no header)
 * or a header naming the columns x, y, ppfd (m, m, µmol m⁻² s⁻¹) followed by one point per line,
 * which must fill a rectangular grid; rows then run by ascending y and columns by ascending x.
 * Readings are µmol m⁻² s⁻¹ and may not be negative. Returns the grid or every problem, by line.
 */
export function parsePpfdGridCsv(text: string, options: ReadOptions = {}): FileChecked<PpfdGrid> {
  const read = readCsvRows(text, options.maxBytes ?? DEFAULT_MAX_BYTES);
  if (!read.ok) return read;
  const [first, ...rest] = read.value;
  if (!first) return refused([lineProblem(1, 'the file has no values')]);
  const problems: FileProblem[] = [];
  const isHeader = first.cells.every((c) => c === '' || numberCell(c) === null);
  const grid = isHeader ? readPoints(first, rest, problems) : readMatrix(read.value, problems);
  if (problems.length === 0 && grid && grid.values.every((r) => r.every((v) => v === 0))) {
    problems.push(fileProblem('every reading is 0; there is no light to summarise'));
  }
  return problems.length > 0 || !grid ? refused(problems) : { ok: true, value: grid };
}
