import { useCallback, useState } from 'react';
import { analysisSettingsSchema } from '../lib/analysis-settings';
import type { AnalysisSettings } from '../lib/analysis-settings';

/** A person's saved analysis settings for one scenario, and how to change them. */
export interface SavedAnalysisSettings {
  /** what was saved, or null when nothing was (the page then starts from defaults) */
  saved: AnalysisSettings | null;
  /** false while saved settings are still being fetched */
  ready: boolean;
  save(settings: AnalysisSettings): void;
  /** forgets what was saved */
  clear(): void;
}

const keyOf = (workspaceId: string, scenarioId: string) => `photon-parity:analysis:${workspaceId}:${scenarioId}`;

function read(key: string): AnalysisSettings | null {
  try {
    const raw = globalThis.localStorage?.getItem(key);
    if (!raw) return null;
    const parsed = analysisSettingsSchema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

function write(key: string, value: AnalysisSettings | null): void {
  try {
    if (value) globalThis.localStorage?.setItem(key, JSON.stringify(value));
    else globalThis.localStorage?.removeItem(key);
  } catch {
    // storage full or disabled: the settings still hold for this visit
  }
}

/**
 * The analysis settings (sweep ranges, swing size, pair, uncertainty ranges and seed) saved for one
 * scenario. They live in this browser's localStorage for now; this file is the only one that knows
 * where, so storing them with the scenario on the server replaces this file alone.
 */
export function useAnalysisSettings(workspaceId: string, scenarioId: string): SavedAnalysisSettings {
  const key = keyOf(workspaceId, scenarioId);
  const [state, setState] = useState(() => ({ key, saved: read(key) }));
  const current = state.key === key ? state : { key, saved: read(key) };
  if (current !== state) setState(current);

  const save = useCallback((settings: AnalysisSettings) => {
    write(key, settings);
    setState({ key, saved: settings });
  }, [key]);

  const clear = useCallback(() => {
    write(key, null);
    setState({ key, saved: null });
  }, [key]);

  return { saved: current.saved, ready: true, save, clear };
}
