import { useCallback, useEffect, useRef, useState } from 'react';
import '../../../contracts/zod-messages';
import type { Problem } from '../../../contracts/problems';
import { createCommandHandler } from '../worker/handle-command';
import type { AnalysisCommand, AnalysisKind, AnalysisReply, ResultOf } from '../worker/protocol';
import { yieldToLoop } from '../worker/yield-to-loop';

/** Where runs happen: a Web Worker, or the page itself (in chunks) where workers are unavailable. */
export type RunPlace = 'worker' | 'page';

/** The state of the latest run of one kind. */
export interface AnalysisRun<K extends AnalysisKind> {
  status: 'idle' | 'running' | 'finished' | 'cancelled' | 'invalid' | 'failed';
  done: number;
  total: number;
  /** the last finished result; kept while a new run is going so the page does not jump */
  result: ResultOf[K] | null;
  problems: Problem[];
  problemSource: 'scenario' | 'settings' | null;
  message: string | null;
  ms: number | null;
  where: RunPlace;
}

type Send = (cmd: AnalysisCommand) => void;

function startWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('../worker/sensitivity-worker.ts', import.meta.url), { type: 'module' });
  } catch {
    return null;
  }
}

/**
 * Runs one kind of sensitivity analysis off the main thread: the worker starts on the first run and
 * ends with the component. Without workers the same handler runs on the page, yielding between
 * chunks so typing and the Cancel button stay responsive. Replies to superseded runs are dropped.
 */
export function useAnalysisRun<K extends AnalysisKind>(kind: K) {
  const [state, setState] = useState<AnalysisRun<K>>({
    status: 'idle', done: 0, total: 0, result: null, problems: [], problemSource: null, message: null, ms: null, where: 'worker',
  });
  const send = useRef<Send | null>(null);
  const worker = useRef<Worker | null>(null);
  const current = useRef(0);
  /** the command of the run still going, if any */
  const pending = useRef<AnalysisCommand | null>(null);

  const apply = useCallback((reply: AnalysisReply, where: RunPlace) => {
    if (reply.job !== current.current) return;
    if (reply.type !== 'progress') pending.current = null;
    setState((prev) => {
      switch (reply.type) {
        case 'progress':
          return { ...prev, status: 'running', done: reply.done, total: reply.total, where };
        case 'finished':
          return reply.kind === kind
            ? { ...prev, status: 'finished', result: reply.result as ResultOf[K], ms: reply.ms, done: prev.total, problems: [], problemSource: null, message: null, where }
            : prev;
        case 'cancelled':
          return { ...prev, status: 'cancelled', done: reply.done, total: reply.total, where };
        case 'invalid':
          return { ...prev, status: 'invalid', problems: reply.problems, problemSource: reply.source, where };
        case 'failed':
          return { ...prev, status: 'failed', message: reply.message, where };
      }
    });
  }, [kind]);

  const onPage = useCallback((): Send => {
    const handle = createCommandHandler({ post: (r) => apply(r, 'page'), pause: yieldToLoop, now: () => performance.now() });
    return (cmd) => void handle(cmd);
  }, [apply]);

  const sender = useCallback((): Send => {
    if (send.current) return send.current;
    const w = startWorker();
    if (!w) {
      send.current = onPage();
      return send.current;
    }
    worker.current = w;
    w.onmessage = (e: MessageEvent<AnalysisReply>) => apply(e.data, 'worker');
    w.onerror = () => {
      w.terminate();
      worker.current = null;
      send.current = onPage();
      if (pending.current) send.current(pending.current);
    };
    send.current = (cmd) => w.postMessage(cmd);
    return send.current;
  }, [apply, onPage]);

  useEffect(() => () => {
    worker.current?.terminate();
    worker.current = null;
    send.current = null;
  }, []);

  /** Starts a run with a scenario and settings as the form holds them; a run still going is cancelled. */
  const run = useCallback((scenario: unknown, settings: unknown) => {
    const post = sender();
    if (pending.current) post({ type: 'cancel', job: pending.current.job });
    const job = ++current.current;
    const cmd = { type: kind, job, scenario, settings } as AnalysisCommand;
    pending.current = cmd;
    setState((prev) => ({ ...prev, status: 'running', done: 0, total: 0, problems: [], problemSource: null, message: null }));
    post(cmd);
  }, [kind, sender]);

  /** Asks the run to stop at its next gap between chunks. */
  const cancel = useCallback(() => {
    if (pending.current) send.current?.({ type: 'cancel', job: pending.current.job });
  }, []);

  return { ...state, run, cancel };
}
