import { byId, describePath, isIdList, isRecord, own, sameValue } from './json-values';

/** One field one editor changed: where (options named by id) and the value before and after; undefined is "not set". */
export interface SideChange {
  where: string;
  before: unknown;
  after: unknown;
}

function walk(before: unknown, after: unknown, steps: string[], out: SideChange[]): void {
  if (sameValue(before, after)) return;
  if (isRecord(before) && isRecord(after)) {
    for (const k of new Set([...Object.keys(before), ...Object.keys(after)])) walk(own(before, k), own(after, k), [...steps, k], out);
    return;
  }
  if (isIdList(before) && isIdList(after)) {
    const [b, a] = [byId(before), byId(after)];
    for (const id of new Set([...b.keys(), ...a.keys()])) walk(b.get(id), a.get(id), [...steps, `[${id}]`], out);
    return;
  }
  if (Array.isArray(before) && Array.isArray(after) && before.length === after.length) {
    before.forEach((x, i) => walk(x, after[i], [...steps, `[${i}]`], out));
    return;
  }
  out.push({ where: describePath(steps), before, after });
}

/**
 * The fields that differ between the version an editor started from and theirs, the same way the
 * merge lines them up: options by id (an added or removed option is one line), growth phases by
 * position, and a list whose length changed as one line.
 */
export function sideChanges(base: unknown, side: unknown): SideChange[] {
  const out: SideChange[] = [];
  walk(base, side, [], out);
  return out;
}
