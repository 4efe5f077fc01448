import Papa from 'papaparse';
import { fileProblem, lineProblem, refused } from './file-problems';
import type { FileChecked, FileProblem } from './file-problems';

/** Largest measurement file accepted by default: 2 MB (2,000,000 bytes, SI megabytes) of UTF-8 text. */
export const DEFAULT_MAX_BYTES = 2_000_000;

/** One non-blank line of a CSV file: its 1-based line number and its trimmed cells. */
export interface CsvRow {
  line: number;
  cells: string[];
}

const DELIMITER_NAMES: Record<string, string> = { ';': 'semicolons', '\t': 'tabs', '|': 'vertical bars' };

/** Bytes the text takes as UTF-8, counted without allocating an encoded copy. */
export function utf8ByteLength(text: string): number {
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code < 0x80) bytes += 1;
    else if (code < 0x800) bytes += 2;
    else if (code >= 0xd800 && code <= 0xdbff && i + 1 < text.length) {
      bytes += 4;
      i++;
    } else bytes += 3;
  }
  return bytes;
}

/**
 * Splits CSV text into non-blank rows with papaparse. Refuses a file over `maxBytes`, an empty file,
 * broken quoting, and values separated by semicolons, tabs or vertical bars instead of commas.
 * Line numbers assume no line break inside a quoted cell, which numeric measurement files never need.
 */
export function readCsvRows(text: string, maxBytes: number = DEFAULT_MAX_BYTES): FileChecked<CsvRow[]> {
  // a UTF-16 code unit never encodes to less than one UTF-8 byte, so the cheap check comes first
  if (text.length > maxBytes || utf8ByteLength(text) > maxBytes) {
    return refused([fileProblem(`is ${utf8ByteLength(text).toLocaleString('en')} bytes; the limit is ${maxBytes.toLocaleString('en')} bytes`)]);
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return refused([lineProblem(1, 'the file is empty')]);

  // the delimiter is fixed rather than guessed: papaparse's guess needs many lines to be sure
  const parsed = Papa.parse<string[]>(body, { delimiter: ',', skipEmptyLines: false });
  const rows = parsed.data
    .map((cells, i) => ({ line: i + 1, cells: cells.map((c) => c.trim()) }))
    .filter((r) => r.cells.some((c) => c !== ''));
  const foreign = rows.find((r) => r.cells.some((c) => /[;\t|]/.test(c)));
  if (foreign) {
    const mark = /[;\t|]/.exec(foreign.cells.find((c) => /[;\t|]/.test(c)) ?? '')?.[0] ?? ';';
    return refused([lineProblem(foreign.line, `values are separated by ${DELIMITER_NAMES[mark]}; separate them with commas and write decimals with a point`)]);
  }
  const problems: FileProblem[] = parsed.errors.map((e) => lineProblem((e.row ?? 0) + 1, `${e.message.replace(/\.$/, '').toLowerCase()}`));
  if (rows.length === 0) problems.push(lineProblem(1, 'the file has no values'));
  return problems.length > 0 ? refused(problems) : { ok: true, value: rows };
}

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A cell as a finite number, or null when it is not written as a plain decimal number. */
export function numberCell(cell: string): number | null {
  if (!NUMBER.test(cell)) return null;
  const value = Number(cell);
  return Number.isFinite(value) ? value : null;
}

/** Why a cell is not a number (an over-long cell is shortened). */
export function notANumber(column: number, cell: string): string {
  if (cell === '') return `column ${column} is empty`;
  return `column ${column}: "${cell.length > 40 ? `${cell.slice(0, 40)}…` : cell}" is not a number`;
}
