import type { FieldProblem } from '../../../lib/api-client';

/** The server's problems split into those of the file's lines (`file, line 17`), of the whole file, and of the form's fields. */
export interface SortedProblems {
  byLine: Map<number, string[]>;
  file: string[];
  fields: Map<string, string[]>;
}

/** Sorts a refused upload's problems for showing beside the lines and the fields they name. */
export function sortProblems(problems: FieldProblem[]): SortedProblems {
  const out: SortedProblems = { byLine: new Map(), file: [], fields: new Map() };
  for (const p of problems) {
    const line = /^file, line (\d+)$/.exec(p.path);
    if (line) out.byLine.set(Number(line[1]), [...(out.byLine.get(Number(line[1])) ?? []), p.message]);
    else if (p.path === 'file') out.file.push(p.message);
    else out.fields.set(p.path, [...(out.fields.get(p.path) ?? []), p.message]);
  }
  return out;
}
