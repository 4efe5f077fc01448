import { setAt } from '../../../engine/sensitivity/inputs';
import { byId, compact, describePath, isIdList, isRecord, mergedOrder, own, sameValue } from './json-values';
import type { Key } from './json-values';

/** Which version a clash is settled with. */
export type Side = 'mine' | 'theirs';

/** One field both editors changed, to different values; undefined means "not set" or "removed". */
export interface Clash {
  /** the field for people, options named by id: `options[led-720].wallWatts` */
  where: string;
  /** where the value sits in the draft */
  keys: Key[];
  base: unknown;
  mine: unknown;
  theirs: unknown;
}

/** Both editors' changes combined; at each clash the draft holds the editor's own value until settled. */
export interface ThreeWayMerge {
  draft: unknown;
  clashes: Clash[];
}

interface Walk {
  keys: Key[];
  steps: string[];
  clashes: Clash[];
}

const into = (w: Walk, key: Key, step: string): Walk => ({ keys: [...w.keys, key], steps: [...w.steps, step], clashes: w.clashes });

function clash(w: Walk, base: unknown, mine: unknown, theirs: unknown): unknown {
  w.clashes.push({ where: describePath(w.steps), keys: w.keys, base, mine, theirs });
  return mine;
}

function mergeValue(base: unknown, mine: unknown, theirs: unknown, w: Walk): unknown {
  if (sameValue(mine, theirs)) return mine;
  if (sameValue(base, mine)) return theirs;
  if (sameValue(base, theirs)) return mine;
  if (isRecord(mine) && isRecord(theirs) && (base === undefined || isRecord(base))) {
    const b = base ?? {};
    const keys = [...new Set([...Object.keys(theirs), ...Object.keys(mine)])];
    const merged = keys.map((k) => [k, mergeValue(own(b, k), own(mine, k), own(theirs, k), into(w, k, k))] as const);
    return Object.fromEntries(merged.filter(([, v]) => v !== undefined));
  }
  if (isIdList(mine) && isIdList(theirs) && (base === undefined || isIdList(base))) {
    const [b, m, t] = [byId(base), byId(mine), byId(theirs)];
    // Items that end up removed stay as holes until settle(), so that the keys of later clashes hold.
    return mergedOrder(theirs, mine).map((id, i) => mergeValue(b.get(id), m.get(id), t.get(id), into(w, i, `[${id}]`)));
  }
  // Rows without ids (growth phases) line up by position only while no side adds or removes one.
  if (Array.isArray(base) && Array.isArray(mine) && Array.isArray(theirs) && base.length === mine.length && mine.length === theirs.length) {
    return mine.map((x, i) => mergeValue(base[i], x, theirs[i], into(w, i, `[${i}]`)));
  }
  return clash(w, base, mine, theirs);
}

/**
 * Three-way merge of JSON documents: `base` is the version both editors started from, `mine` the
 * editor's unsaved one, `theirs` the one saved in the meantime. A field changed on one side only
 * takes that change; a field changed on both sides to different values is a clash. Objects merge
 * key by key; lists of objects with unique `id`s (options) merge item by item by id, so an item
 * added, removed or edited on either side survives; other lists merge by position while all three
 * have the same length, and are one clash otherwise.
 */
export function threeWayMerge(base: unknown, mine: unknown, theirs: unknown): ThreeWayMerge {
  const clashes: Clash[] = [];
  const draft = mergeValue(base, mine, theirs, { keys: [], steps: [], clashes });
  return { draft, clashes };
}

/**
 * The merged document with each clash settled as chosen (keyed by `where`; the editor's own value
 * where no choice is given), removed items and unset fields dropped.
 */
export function settle(merge: ThreeWayMerge, choices: Readonly<Record<string, Side>>): unknown {
  let doc = merge.draft;
  for (const c of merge.clashes) doc = c.keys.length === 0 ? c[choices[c.where] ?? 'mine'] : setAt(doc, c.keys, c[choices[c.where] ?? 'mine']);
  return compact(doc);
}
