import type { Problem } from '../../../contracts/problems';
import type { Scenario } from '../../../contracts/scenario';
import type { ScenarioResult } from '../../../engine/result-types';

/** What the page asks the compute worker to do. */
export type ComputeCommand = { type: 'compute'; id: number; document: unknown };

/** What the worker answers: a result, the problems that keep the document from computing, or a failure. */
export type ComputeReply =
  | { type: 'computed'; id: number; scenario: Scenario; result: ScenarioResult; ms: number }
  | { type: 'invalid'; id: number; problems: Problem[] }
  | { type: 'failed'; id: number; message: string };
