import type { ScenarioResult } from './result-types';

/** One figure that differs between a stored result and a recomputation. */
export interface FigureDifference {
  /** e.g. `options[1].totalPresentValue` or `options[0].years[3].energy` */
  path: string;
  stored: string | number | null;
  recomputed: string | number | null;
}

/** Whether a stored result is what the current engine computes from the same inputs. */
export interface ReproduceReport {
  reproduces: boolean;
  storedEngineVersion: string;
  currentEngineVersion: string;
  /** true when both results were computed from inputs with the same hash */
  sameInputs: boolean;
  differences: FigureDifference[];
}

/** Relative tolerance for plain-number figures (counts, PPFD, kWh); money must match digit for digit. */
export const FIGURE_TOLERANCE = 1e-12;

function same(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' && typeof b === 'number') return Math.abs(a - b) <= FIGURE_TOLERANCE * Math.max(1, Math.abs(a), Math.abs(b));
  return a === b;
}

function walk(stored: unknown, recomputed: unknown, path: string, out: FigureDifference[]): void {
  if (Array.isArray(stored) && Array.isArray(recomputed)) {
    const n = Math.max(stored.length, recomputed.length);
    for (let i = 0; i < n; i++) walk(stored[i], recomputed[i], `${path}[${i}]`, out);
    return;
  }
  if (stored && recomputed && typeof stored === 'object' && typeof recomputed === 'object') {
    const keys = new Set([...Object.keys(stored), ...Object.keys(recomputed)]);
    for (const key of keys) {
      if (key === 'engineVersion') continue;
      walk((stored as Record<string, unknown>)[key], (recomputed as Record<string, unknown>)[key], path ? `${path}.${key}` : key, out);
    }
    return;
  }
  if (!same(stored, recomputed)) {
    const show = (v: unknown) => (v === undefined ? null : typeof v === 'object' ? JSON.stringify(v) : (v as string | number | null));
    out.push({ path, stored: show(stored), recomputed: show(recomputed) });
  }
}

/**
 * Compares a result stored with a snapshot against the current engine's recomputation of the same
 * inputs, figure by figure: money as exact decimal text, other numbers to 1e-12 relative.
 */
export function compareResults(stored: ScenarioResult, recomputed: ScenarioResult): ReproduceReport {
  const differences: FigureDifference[] = [];
  walk(stored, recomputed, '', differences);
  return {
    reproduces: differences.length === 0,
    storedEngineVersion: stored.engineVersion,
    currentEngineVersion: recomputed.engineVersion,
    sameInputs: stored.inputHash === recomputed.inputHash,
    differences,
  };
}
