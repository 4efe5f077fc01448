/** A step of a path: an object key or an array index. */
export type Key = string | number;

/** A plain object (not an array, not null). */
export function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The value under an object's own key: a key such as `__proto__` read from JSON is data, not the prototype. */
export function own(o: Record<string, unknown>, k: string): unknown {
  return Object.hasOwn(o, k) ? o[k] : undefined;
}

/**
 * Deep equality of JSON-like values; a key holding undefined counts as absent, because JSON
 * (what the server stores) has no undefined.
 */
export function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) || Array.isArray(b)) {
    if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
    return a.every((x, i) => sameValue(x, b[i]));
  }
  if (isRecord(a) && isRecord(b)) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const k of keys) if (!sameValue(own(a, k), own(b, k))) return false;
    return true;
  }
  return false;
}

/** An array whose items are all objects with a string `id`, each id once: the scenario's options. */
export function isIdList(v: unknown): v is Array<Record<string, unknown> & { id: string }> {
  if (!Array.isArray(v)) return false;
  const seen = new Set<string>();
  for (const item of v) {
    if (!isRecord(item) || typeof item.id !== 'string' || seen.has(item.id)) return false;
    seen.add(item.id);
  }
  return true;
}

/** The items of an id list by id. */
export function byId(v: unknown): Map<string, Record<string, unknown>> {
  return new Map(isIdList(v) ? v.map((o) => [o.id, o]) : []);
}

/**
 * A path for people: Problem notation (`electricity.pricePerKwh`, `schedule[0].hoursPerDay`), except
 * that an option is named by its id (`options[led-720].wallWatts`), which is the same in every
 * version whatever its position.
 */
export function describePath(steps: readonly string[]): string {
  let out = '';
  for (const s of steps) out += s.startsWith('[') ? s : out ? `.${s}` : s;
  return out || '(whole scenario)';
}

/** A copy without undefined: such keys are dropped and such array items removed (a removed option). */
export function compact(v: unknown): unknown {
  if (Array.isArray(v)) return v.filter((x) => x !== undefined).map(compact);
  if (isRecord(v)) {
    return Object.fromEntries(Object.entries(v).flatMap(([k, x]) => (x === undefined ? [] : [[k, compact(x)]])));
  }
  return v;
}

/**
 * Where each item of a merged id list goes: the latest stored order (theirs) first, then each item
 * only the editor's version has, right after the item that precedes it there (or first).
 */
export function mergedOrder(theirs: unknown, mine: unknown): string[] {
  const order = isIdList(theirs) ? theirs.map((o) => o.id) : [];
  let previous: string | null = null;
  for (const o of isIdList(mine) ? mine : []) {
    if (!order.includes(o.id)) order.splice(previous === null ? 0 : order.indexOf(previous) + 1, 0, o.id);
    previous = o.id;
  }
  return order;
}
