import type { z } from 'zod';

/** One thing wrong with an input: where (a field path such as `options[0].photonEfficacy`) and which rule failed. */
export interface Problem {
  path: string;
  message: string;
}

/** Writes a zod path the way a reader of the file would point at it: `options[0].lamp.price`. */
export function formatPath(path: ReadonlyArray<PropertyKey>): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out ? `.${String(key)}` : String(key);
  }
  return out || '(file)';
}

/** Every issue of a failed parse as a Problem, in the order zod found them; unknown keys each get their own line. */
export function problemsFromZod(error: z.ZodError): Problem[] {
  const problems: Problem[] = [];
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) {
        problems.push({ path: formatPath([...issue.path, key]), message: 'is not a known field (check its spelling)' });
      }
      continue;
    }
    problems.push({ path: formatPath(issue.path), message: issue.message });
  }
  return problems;
}

/** `options[0].photonEfficacy: must be greater than 0` */
export function problemLine(p: Problem): string {
  return `${p.path}: ${p.message}`;
}

/** Result of checking an input against a schema: the parsed value, or every problem found. */
export type Checked<T> = { ok: true; value: T } | { ok: false; problems: Problem[] };

/** Parses with a zod schema and reports all problems at once rather than the first. */
export function check<S extends z.ZodType>(schema: S, input: unknown): Checked<z.output<S>> {
  const result = schema.safeParse(input);
  return result.success ? { ok: true, value: result.data } : { ok: false, problems: problemsFromZod(result.error) };
}
