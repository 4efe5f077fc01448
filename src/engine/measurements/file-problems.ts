import type { Problem } from '../../contracts/problems';

/**
 * One thing wrong with a measurement file. `path` is `line N` (1-based, as a text editor counts)
 * or `(file)` when no single line is to blame; `line` carries the same N as a number, or null.
 */
export interface FileProblem extends Problem {
  line: number | null;
}

/** A parsed measurement file, or every problem found in it (assignable to `Checked<T>`). */
export type FileChecked<T> = { ok: true; value: T } | { ok: false; problems: FileProblem[] };

/** A problem on one line of the file. */
export function lineProblem(line: number, message: string): FileProblem {
  return { path: `line ${line}`, message, line };
}

/** A problem with the file as a whole. */
export function fileProblem(message: string): FileProblem {
  return { path: '(file)', message, line: null };
}

/** The failed form of FileChecked. */
export function refused<T>(problems: FileProblem[]): FileChecked<T> {
  return { ok: false, problems };
}
