import { applyPatches, enablePatches, produceWithPatches } from 'immer';
import type { Draft, Patch } from 'immer';

enablePatches();

/** One undoable step: the patches that made it and those that take it back. */
interface Step {
  patches: Patch[];
  inverse: Patch[];
  /** the single path an edit touched, so consecutive keystrokes in one field merge into one step */
  key: string | null;
  at: number;
}

type Json = unknown;

/** Writes `next` into the draft, touching only what differs, so the patches name exactly the changed fields. */
function assignDiff(draft: Record<string, Json> | Json[], next: Record<string, Json> | Json[]): void {
  if (Array.isArray(draft) && Array.isArray(next)) {
    if (draft.length > next.length) draft.length = next.length;
    next.forEach((v, i) => writeOne(draft as unknown as Record<string, Json>, String(i), v));
    return;
  }
  const d = draft as Record<string, Json>;
  const n = next as Record<string, Json>;
  for (const k of Object.keys(d)) if (!(k in n) || n[k] === undefined) delete d[k];
  for (const [k, v] of Object.entries(n)) if (v !== undefined) writeOne(d, k, v);
}

function writeOne(d: Record<string, Json>, k: string, v: Json): void {
  const cur = d[k];
  const bothArrays = Array.isArray(cur) && Array.isArray(v);
  const bothObjects = isPlainObject(cur) && isPlainObject(v);
  if (bothArrays || bothObjects) assignDiff(cur as Record<string, Json>, v as Record<string, Json>);
  else if (!Object.is(cur, v)) d[k] = v;
}

function isPlainObject(v: Json): v is Record<string, Json> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Edits closer together than this, in the same field, become one undo step. */
export const MERGE_WINDOW_MS = 1000;

/**
 * Undo and redo over a JSON document with immer patches: each recorded state is stored as the
 * patches from the previous one, so history stays small however large the document is.
 */
export class UndoHistory<T extends object> {
  private past: Step[] = [];
  private future: Step[] = [];
  constructor(private current: T) {}

  /** The document as history knows it. */
  get value(): T {
    return this.current;
  }

  get canUndo(): boolean {
    return this.past.length > 0;
  }

  get canRedo(): boolean {
    return this.future.length > 0;
  }

  /** Records a new state; returns false when nothing changed. */
  record(next: T, now: number): boolean {
    const [value, patches, inverse] = produceWithPatches(this.current, (draft: Draft<T>) => {
      assignDiff(draft as unknown as Record<string, Json>, next as unknown as Record<string, Json>);
    });
    if (patches.length === 0) return false;
    const key = patches.length === 1 && patches[0] ? patches[0].path.join('.') : null;
    const last = this.past[this.past.length - 1];
    if (last && key !== null && last.key === key && now - last.at < MERGE_WINDOW_MS) {
      last.patches = [...last.patches, ...patches];
      last.inverse = [...inverse, ...last.inverse];
      last.at = now;
    } else {
      this.past.push({ patches, inverse, key, at: now });
    }
    this.future = [];
    this.current = value;
    return true;
  }

  /** Steps back; returns the earlier state, or null when there is none. */
  undo(): T | null {
    const step = this.past.pop();
    if (!step) return null;
    this.current = applyPatches(this.current, step.inverse);
    this.future.push(step);
    return this.current;
  }

  /** Steps forward again; returns the later state, or null when there is none. */
  redo(): T | null {
    const step = this.future.pop();
    if (!step) return null;
    this.current = applyPatches(this.current, step.patches);
    this.past.push({ ...step, key: null });
    return this.current;
  }

  /** Starts over from a state (after loading a revision): no undo beyond it. */
  reset(value: T): void {
    this.current = value;
    this.past = [];
    this.future = [];
  }
}
