import { useCallback, useEffect, useRef, useState } from 'react';
import type { Scenario } from '../../../contracts/scenario';
import type { UncertaintySettings } from '../../../contracts/sensitivity';
import { planUncertainty, summarizeUncertainty, uncertaintyDraws } from '../../../engine/sensitivity/uncertainty';
import type { UncertaintyChunk, UncertaintySummary } from '../../../engine/sensitivity/uncertainty';

const DRAWS_PER_CHUNK = 1000;

/** Where a rerun in this browser stands. */
export type RerunState =
  | { status: 'idle' }
  | { status: 'running'; done: number; total: number }
  | { status: 'done'; summary: UncertaintySummary }
  | { status: 'failed'; message: string };

const nextTask = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/**
 * Reruns a snapshot's uncertainty settings with this browser's engine, in chunks of draws with a
 * pause between them so the page keeps answering. Chunks give the same numbers as one pass (the
 * draws are numbered), so the result is the one any other machine gets for the same seed.
 */
export function useUncertaintyRerun(scenario: Scenario, settings: UncertaintySettings | null) {
  const [state, setState] = useState<RerunState>({ status: 'idle' });
  const alive = useRef(true);
  useEffect(() => {
    alive.current = true;
    return () => {
      alive.current = false;
    };
  }, []);

  const run = useCallback(async () => {
    if (!settings) return;
    try {
      const plan = planUncertainty(scenario, settings);
      const chunks: UncertaintyChunk[] = [];
      for (let from = 0; from < settings.draws; from += DRAWS_PER_CHUNK) {
        setState({ status: 'running', done: from, total: settings.draws });
        await nextTask();
        if (!alive.current) return;
        chunks.push(uncertaintyDraws(plan, from, from + DRAWS_PER_CHUNK));
      }
      setState({ status: 'done', summary: summarizeUncertainty(plan, chunks) });
    } catch (error) {
      if (alive.current) setState({ status: 'failed', message: error instanceof Error ? error.message : String(error) });
    }
  }, [scenario, settings]);

  return { state, run };
}
