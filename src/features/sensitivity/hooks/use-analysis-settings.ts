import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { isApiError } from '../../../lib/api-client';
import { getAnalysisQueryOptions } from '../api/get-analysis';
import { saveAnalysis } from '../api/save-analysis';
import { analysisSettingsSchema } from '../lib/analysis-settings';
import type { AnalysisSettings } from '../lib/analysis-settings';

/** The analysis settings kept with one scenario, and how to change them. */
export interface SavedAnalysisSettings {
  /** what was saved, or null when nothing was (the page then starts from defaults) */
  saved: AnalysisSettings | null;
  /** true once the server has said what is saved (false while fetching, and after a failed fetch) */
  ready: boolean;
  /** true while the kept settings are still being fetched */
  loading: boolean;
  /** false for readers who may not change the scenario: their changes last for this visit only */
  shared: boolean;
  /** where the last change stands: waiting or on its way, kept on the server, or refused (null before any change) */
  status: SaveStatus;
  save(settings: AnalysisSettings): void;
  /** forgets what was saved, so the page starts again from suggested settings */
  clear(): void;
}

/** Where the editor's last change of the settings stands. */
export type SaveStatus = 'saving' | 'saved' | 'failed' | null;

const SAVE_DELAY_MS = 600;

/**
 * The analysis settings (sweep ranges, swing size, pair, uncertainty ranges and seed) kept with the
 * scenario on the server, so everyone who opens it reruns the same draws. Editors' changes are
 * written back after a short pause; a viewer's (refused with 403) stay in this visit.
 */
export function useAnalysisSettings(workspaceId: string, scenarioId: string): SavedAnalysisSettings {
  const queryClient = useQueryClient();
  const query = useQuery(getAnalysisQueryOptions(workspaceId, scenarioId));
  const [local, setLocal] = useState<{ sid: string; settings: AnalysisSettings | null } | null>(null);
  const [shared, setShared] = useState(true);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const pending = useRef<AnalysisSettings | null>(null);
  const sendNow = useRef(true);
  const [status, setStatus] = useState<SaveStatus>(null);
  // Only the reply to the latest change may say "saved": an earlier reply arriving late says nothing.
  const latest = useRef(0);

  const send = useCallback(
    (settings: AnalysisSettings) => {
      pending.current = null;
      const n = ++latest.current;
      setStatus('saving');
      saveAnalysis(workspaceId, scenarioId, settings).then(
        (reply) => {
          queryClient.setQueryData(getAnalysisQueryOptions(workspaceId, scenarioId).queryKey, reply);
          if (n === latest.current) setStatus('saved');
        },
        (error: unknown) => {
          if (isApiError(error, 'forbidden')) {
            setShared(false);
            setStatus(null);
          } else if (n === latest.current) setStatus('failed');
        },
      );
    },
    [workspaceId, scenarioId, queryClient],
  );

  // Leaving the page (or the scenario) sends what is still waiting rather than dropping it.
  useEffect(
    () => () => {
      clearTimeout(timer.current);
      if (pending.current) send(pending.current);
    },
    [send],
  );

  const save = useCallback(
    (settings: AnalysisSettings) => {
      setLocal({ sid: scenarioId, settings });
      clearTimeout(timer.current);
      if (!shared) return;
      // The first save of a visit or after starting again (which fixes the seed) is sent at once;
      // edits after that, a short pause after the last keystroke.
      if (sendNow.current) {
        sendNow.current = false;
        return send(settings);
      }
      pending.current = settings;
      latest.current++;
      setStatus('saving');
      timer.current = setTimeout(() => send(settings), SAVE_DELAY_MS);
    },
    [scenarioId, shared, send],
  );

  const clear = useCallback(() => {
    // An edit still waiting to be sent belongs to the settings being dropped: sent later, it would
    // overwrite the fresh ones (and their new seed) on the server.
    clearTimeout(timer.current);
    pending.current = null;
    sendNow.current = true;
    setLocal({ sid: scenarioId, settings: null });
  }, [scenarioId]);

  const fromServer = query.data?.settings ? analysisSettingsSchema.safeParse(query.data.settings) : undefined;
  const mine = local?.sid === scenarioId ? local : null;
  const saved = mine ? mine.settings : fromServer?.success ? fromServer.data : null;
    // Ready only once the server has answered: a failed read is not "nothing saved", and must not lead
  // the page to store fresh suggested settings (a new seed) over the ones kept.
  return { saved, ready: query.isSuccess, loading: query.isPending, shared, status, save, clear };
}
