import type { Problem } from '../../../contracts/problems';
import type { SweepResult } from '../../../engine/sensitivity/sweep';
import type { SwingResult } from '../../../engine/sensitivity/swings';
import type { UncertaintySummary } from '../../../engine/sensitivity/uncertainty';
import type { BreakevenReport } from './breakeven-report';

/** The four kinds of run the sensitivity worker does. */
export type AnalysisKind = 'sweep' | 'swings' | 'breakeven' | 'uncertainty';

/** What each kind of run gives back. */
export interface ResultOf {
  sweep: SweepResult;
  swings: SwingResult;
  breakeven: BreakevenReport;
  uncertainty: UncertaintySummary;
}

/**
 * Start a run. The scenario and settings are checked again on arrival (shared zod schemas plus the
 * engine's checks against the scenario), so the sender may pass what a form holds.
 */
export type RunCommand = { [K in AnalysisKind]: { type: K; job: number; scenario: unknown; settings: unknown } }[AnalysisKind];

/** Stop a run at the next gap between chunks. */
export type CancelCommand = { type: 'cancel'; job: number };

/** Everything the page may send to the worker. */
export type AnalysisCommand = RunCommand | CancelCommand;

/** A finished run of one kind, with the time it took in ms. */
export type FinishedReply = { [K in AnalysisKind]: { type: 'finished'; job: number; kind: K; result: ResultOf[K]; ms: number } }[AnalysisKind];

/** Everything the worker sends back; `done` and `total` count chunks' units (rows, inputs, draws or steps). */
export type AnalysisReply =
  | { type: 'progress'; job: number; done: number; total: number }
  | FinishedReply
  | { type: 'cancelled'; job: number; done: number; total: number }
  | { type: 'invalid'; job: number; source: 'scenario' | 'settings'; problems: Problem[] }
  | { type: 'failed'; job: number; message: string };
