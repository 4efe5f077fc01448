import { formatPath } from '../../../src/contracts/problems';

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function walk(a: unknown, b: unknown, path: PropertyKey[], out: string[]): void {
  if (Array.isArray(a) && Array.isArray(b)) {
    for (let i = 0; i < Math.max(a.length, b.length); i++) walk(a[i], b[i], [...path, i], out);
    return;
  }
  if (isObject(a) && isObject(b)) {
    for (const key of [...new Set([...Object.keys(a), ...Object.keys(b)])].sort()) walk(a[key], b[key], [...path, key], out);
    return;
  }
  if (JSON.stringify(a) !== JSON.stringify(b)) out.push(formatPath(path));
}

/**
 * The field paths whose values differ between two scenario documents, in the notation of Problem
 * lines (`electricity.pricePerKwh`, `options[1].wallWatts`); an added or removed option shows as
 * its index (`options[3]`).
 */
export function changedPaths(before: unknown, after: unknown): string[] {
  const out: string[] = [];
  walk(before, after, [], out);
  return out;
}
