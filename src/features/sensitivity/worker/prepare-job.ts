import { check } from '../../../contracts/problems';
import type { Problem } from '../../../contracts/problems';
import type { Scenario } from '../../../contracts/scenario';
import {
  breakevenPriceSettingsSchema,
  sweepSettingsSchema,
  swingSettingsSchema,
  uncertaintySettingsSchema,
} from '../../../contracts/sensitivity';
import { parseScenario } from '../../../engine/parse';
import { checkSweepSettings, checkUncertaintySettings } from '../../../engine/sensitivity/checks';
import { assembleSweep, planSweep, sweepRows } from '../../../engine/sensitivity/sweep';
import type { SweepRows } from '../../../engine/sensitivity/sweep';
import { assembleSwings, checkSwingSettings, planSwings, swingRows } from '../../../engine/sensitivity/swings';
import type { SwingResult } from '../../../engine/sensitivity/swings';
import { planUncertainty, summarizeUncertainty, uncertaintyDraws } from '../../../engine/sensitivity/uncertainty';
import type { UncertaintyChunk } from '../../../engine/sensitivity/uncertainty';
import { breakevenSteps } from './breakeven-report';
import type { AnalysisKind, FinishedReply, RunCommand } from './protocol';

/** A run cut into chunks: `step` does the next chunk and returns how many units are done. */
export interface Job {
  kind: AnalysisKind;
  /** units of work: tariff rows, swung inputs, break-even steps or draws */
  total: number;
  step(): number;
  /** the finished reply, once every chunk has run */
  finish(job: number, ms: number): FinishedReply;
}

/** A job ready to run, or why it cannot start. */
export type Prepared = { ok: true; job: Job } | { ok: false; source: 'scenario' | 'settings'; problems: Problem[] };

/** Cells per sweep chunk: a few milliseconds of work, so a cancel is seen quickly. */
const SWEEP_CELLS_PER_CHUNK = 4000;
/** Swung inputs per chunk: each one validates two scenarios with the full schema. */
const SWINGS_PER_CHUNK = 2;
/** Draws per chunk: at least this many, and at most 100 chunks in a run. */
const MIN_DRAWS_PER_CHUNK = 250;

/** Draws per chunk of an uncertainty run of n draws. */
export function drawsPerChunk(n: number): number {
  return Math.max(MIN_DRAWS_PER_CHUNK, Math.ceil(n / 100));
}

function sweepJob(s: Scenario, raw: unknown): Prepared {
  const parsed = check(sweepSettingsSchema, raw);
  if (!parsed.ok) return { ok: false, source: 'settings', problems: parsed.problems };
  const problems = checkSweepSettings(s, parsed.value);
  if (problems.length > 0) return { ok: false, source: 'settings', problems };
  const plan = planSweep(s, parsed.value);
  const rowsPerChunk = Math.max(1, Math.floor(SWEEP_CELLS_PER_CHUNK / plan.efficacyFactors.length));
  const chunks: SweepRows[] = [];
  let done = 0;
  const job: Job = {
    kind: 'sweep',
    total: plan.tariffs.length,
    step: () => {
      const rows = sweepRows(plan, done, done + rowsPerChunk);
      chunks.push(rows);
      done = rows.to;
      return done;
    },
    finish: (id, ms) => ({ type: 'finished', job: id, kind: 'sweep', result: assembleSweep(plan, chunks), ms }),
  };
  return { ok: true, job };
}

function swingsJob(s: Scenario, raw: unknown): Prepared {
  const parsed = check(swingSettingsSchema, raw);
  if (!parsed.ok) return { ok: false, source: 'settings', problems: parsed.problems };
  const problems = checkSwingSettings(s, parsed.value);
  if (problems.length > 0) return { ok: false, source: 'settings', problems };
  const plan = planSwings(s, parsed.value);
  const rows: SwingResult['rows'] = [];
  const invalid: SwingResult['invalid'] = [];
  let done = 0;
  const job: Job = {
    kind: 'swings',
    total: plan.inputs.length,
    step: () => {
      const part = swingRows(plan, done, done + SWINGS_PER_CHUNK);
      rows.push(...part.rows);
      invalid.push(...part.invalid);
      done = Math.min(done + SWINGS_PER_CHUNK, plan.inputs.length);
      return done;
    },
    finish: (id, ms) => ({ type: 'finished', job: id, kind: 'swings', ms, result: assembleSwings(plan, rows, invalid) }),
  };
  return { ok: true, job };
}

function breakevenJob(s: Scenario, raw: unknown): Prepared {
  const parsed = check(breakevenPriceSettingsSchema, raw);
  if (!parsed.ok) return { ok: false, source: 'settings', problems: parsed.problems };
  const { a, b } = parsed.value;
  const ids = s.options.map((o) => o.id);
  const problems = [a, b].flatMap((id, i) => (ids.includes(id) ? [] : [{ path: i === 0 ? 'a' : 'b', message: `names no option of this scenario (ids: ${ids.join(', ')})` }]));
  if (problems.length > 0) return { ok: false, source: 'settings', problems };
  const { steps, report } = breakevenSteps(s, a, b);
  let done = 0;
  const job: Job = {
    kind: 'breakeven',
    total: steps.length,
    step: () => {
      steps[done]!();
      done += 1;
      return done;
    },
    finish: (id, ms) => ({ type: 'finished', job: id, kind: 'breakeven', result: report(), ms }),
  };
  return { ok: true, job };
}

function uncertaintyJob(s: Scenario, raw: unknown): Prepared {
  const parsed = check(uncertaintySettingsSchema, raw);
  if (!parsed.ok) return { ok: false, source: 'settings', problems: parsed.problems };
  const problems = checkUncertaintySettings(s, parsed.value);
  if (problems.length > 0) return { ok: false, source: 'settings', problems };
  const plan = planUncertainty(s, parsed.value);
  const per = drawsPerChunk(parsed.value.draws);
  const chunks: UncertaintyChunk[] = [];
  let done = 0;
  const job: Job = {
    kind: 'uncertainty',
    total: parsed.value.draws,
    step: () => {
      const chunk = uncertaintyDraws(plan, done, done + per);
      chunks.push(chunk);
      done = chunk.to;
      return done;
    },
    finish: (id, ms) => ({ type: 'finished', job: id, kind: 'uncertainty', result: summarizeUncertainty(plan, chunks), ms }),
  };
  return { ok: true, job };
}

/** Checks a run command's scenario and settings and cuts the run into chunks. */
export function prepareJob(cmd: RunCommand): Prepared {
  const scenario = parseScenario(cmd.scenario);
  if (!scenario.ok) return { ok: false, source: 'scenario', problems: scenario.problems };
  const s = scenario.value;
  switch (cmd.type) {
    case 'sweep':
      return sweepJob(s, cmd.settings);
    case 'swings':
      return swingsJob(s, cmd.settings);
    case 'breakeven':
      return breakevenJob(s, cmd.settings);
    case 'uncertainty':
      return uncertaintyJob(s, cmd.settings);
  }
}
