import { useEffect, useRef, useState } from 'react';
import type { Problem } from '../../../contracts/problems';
import type { Scenario } from '../../../contracts/scenario';
import type { ScenarioResult } from '../../../engine/result-types';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import type { ComputeCommand, ComputeReply } from '../worker/protocol';
import { runCommand } from '../worker/run-command';

/** The latest computation of the document being edited. */
export interface LiveResults {
  /** the last result that computed; kept while the document is briefly invalid so the page does not jump */
  result: ScenarioResult | null;
  /** the validated document the result was computed from */
  scenario: Scenario | null;
  /** problems of the current document, or [] when it computes */
  problems: Problem[];
  failure: string | null;
  /** ms the last computation took, and where it ran */
  ms: number | null;
  where: 'worker' | 'page';
  busy: boolean;
}

function startWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('../worker/compute-worker.ts', import.meta.url), { type: 'module' });
  } catch {
    return null;
  }
}

/**
 * Recomputes the document with the engine as it changes: debounced, in a Web Worker so typing never
 * waits for it, and on the page itself when workers are unavailable. Replies to stale requests are dropped.
 */
export function useLiveResults(document: unknown, delayMs = 150): LiveResults {
  const settled = useDebouncedValue(document, delayMs);
  const [state, setState] = useState<LiveResults>({ result: null, scenario: null, problems: [], failure: null, ms: null, where: 'worker', busy: true });
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  const [usePage, setUsePage] = useState(false);

  useEffect(() => {
    const w = startWorker();
    if (!w) {
      setUsePage(true);
      return undefined;
    }
    worker.current = w;
    w.onerror = () => {
      w.terminate();
      worker.current = null;
      setUsePage(true);
    };
    return () => {
      w.terminate();
      worker.current = null;
    };
  }, []);

  useEffect(() => {
    const apply = (reply: ComputeReply, where: LiveResults['where']) => {
      if (reply.id !== seq.current) return;
      setState((prev) => {
        if (reply.type === 'computed') return { result: reply.result, scenario: reply.scenario, problems: [], failure: null, ms: reply.ms, where, busy: false };
        if (reply.type === 'invalid') return { ...prev, problems: reply.problems, failure: null, busy: false, where };
        return { ...prev, problems: [], failure: reply.message, busy: false, where };
      });
    };
    const id = ++seq.current;
    const cmd: ComputeCommand = { type: 'compute', id, document: settled };
    const w = worker.current;
    if (w && !usePage) {
      w.onmessage = (e: MessageEvent<ComputeReply>) => apply(e.data, 'worker');
      w.postMessage(cmd);
    } else {
      const t = setTimeout(() => apply(runCommand(cmd, () => performance.now()), 'page'), 0);
      return () => clearTimeout(t);
    }
    return undefined;
  }, [settled, usePage]);

  return state;
}
