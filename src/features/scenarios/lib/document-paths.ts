import { getAt, pathKeys } from '../../../engine/sensitivity/inputs';

/** Splits a path in the notation of Problem lines (`options[1].wallWatts`) into its steps (the engine's own reader). */
export const parsePath = pathKeys;

/** The value at `path` in a document, or undefined when any step is missing. */
export function valueAtPath(document: unknown, path: string): unknown {
  return getAt(document, pathKeys(path));
}

const LONGEST = 120;

/** A value as one line of text for a table cell: absent, text as written, numbers as stored, the rest as compact JSON. */
export function displayValue(value: unknown): string {
  if (value === undefined) return '(not set)';
  if (value === null) return '(empty)';
  if (typeof value === 'string') return value === '' ? '(blank)' : value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  const text = JSON.stringify(value);
  return text.length > LONGEST ? `${text.slice(0, LONGEST - 1)}…` : text;
}

/** What a table of changes shows for one field path. */
export interface FieldChange {
  path: string;
  before: string;
  after: string;
}

/** The before and after values of each changed path between two documents. */
export function fieldChanges(before: unknown, after: unknown, paths: readonly string[]): FieldChange[] {
  return paths.map((path) => ({ path, before: displayValue(valueAtPath(before, path)), after: displayValue(valueAtPath(after, path)) }));
}
