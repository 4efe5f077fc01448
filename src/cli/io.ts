import { readFileSync, statSync } from 'node:fs';
import { InputError } from './errors';

/** Reads a text file named on the command line, turning a missing or unreadable file into an InputError. */
export function readInputFile(path: string | undefined, what = 'FILE'): string {
  if (!path) throw new InputError([`${what}: is required`]);
  try {
    if (statSync(path).isDirectory()) throw new InputError([`${path}: is a folder, not a file`]);
    return readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof InputError) throw error;
    const code = (error as NodeJS.ErrnoException).code;
    throw new InputError([`${path}: cannot be read (${code === 'ENOENT' ? 'no such file' : code ?? 'unknown error'})`]);
  }
}

/** Parses JSON text from a named file; a syntax error becomes an InputError naming the file and position. */
export function parseJsonFile(path: string, text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (error) {
    throw new InputError([`${path}: is not valid JSON (${(error as Error).message})`]);
  }
}

/** Writes one JSON document to stdout. */
export function printJson(value: unknown): void {
  process.stdout.write(`${JSON.stringify(value, null, 2)}\n`);
}

/** Renders rows as a plain aligned text table; numbers right-aligned. */
export function table(header: string[], rows: (string | number)[][]): string {
  const cells = [header, ...rows.map((r) => r.map(String))];
  const widths = header.map((_, i) => Math.max(...cells.map((r) => (r[i] ?? '').length)));
  const line = (r: string[], numeric: boolean[]) =>
    r.map((c, i) => (numeric[i] ? c.padStart(widths[i] ?? 0) : c.padEnd(widths[i] ?? 0))).join('  ').trimEnd();
  const numeric = header.map((_, i) => rows.length > 0 && rows.every((r) => typeof r[i] === 'number' || /^-?[\d.,]+( ?%)?$/.test(String(r[i]))));
  return [line(header, numeric.map(() => false)), widths.map((w) => '-'.repeat(w)).join('  '), ...cells.slice(1).map((r) => line(r, numeric))].join('\n');
}
