import type { Problem } from '../contracts/problems';
import { problemLine } from '../contracts/problems';

/**
 * Invalid input: a file, a flag or a field the user can fix. The CLI prints one line per problem
 * and exits with 2, never with a stack trace.
 */
export class InputError extends Error {
  readonly lines: string[];
  constructor(lines: string[] | Problem[]) {
    const text = lines.map((l) => (typeof l === 'string' ? l : problemLine(l)));
    super(text.join('\n'));
    this.lines = text;
  }
}
