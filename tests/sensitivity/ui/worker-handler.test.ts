import { describe, expect, it } from 'vitest';
import type { SweepSettings, UncertaintySettings } from '../../../src/contracts/sensitivity';
import { breakevenPrice, runSweep, runUncertainty, triangularMean } from '../../../src/engine';
import { createCommandHandler } from '../../../src/features/sensitivity/worker/handle-command';
import type { AnalysisCommand, AnalysisReply, FinishedReply } from '../../../src/features/sensitivity/worker/protocol';
import { yieldToLoop } from '../../../src/features/sensitivity/worker/yield-to-loop';
import { sixOptionInput, sixOptions } from '../fixtures';

/** Runs commands through the handler as the worker would, collecting every reply. */
function harness(onReply?: (r: AnalysisReply, send: (c: AnalysisCommand) => Promise<void>) => void) {
  const replies: AnalysisReply[] = [];
  let tick = 0;
  const send = createCommandHandler({
    post: (r) => {
      replies.push(r);
      onReply?.(r, send);
    },
    pause: yieldToLoop,
    now: () => tick++,
  });
  return { replies, send };
}

const finished = (replies: AnalysisReply[]): FinishedReply => {
  const last = replies.at(-1);
  if (last?.type !== 'finished') throw new Error(`the run did not finish: ${JSON.stringify(last)}`);
  return last;
};

const uncertainty = (seed: number, draws = 10_000): UncertaintySettings => ({
  seed,
  draws,
  inputs: [
    { path: 'electricity.pricePerKwh', low: 0.12, likely: 0.24, high: 0.45 },
    { path: 'options[3].photonEfficacy', low: 2.2, likely: 2.7, high: 3.0 },
    { path: 'options[1].fixturePrice', low: 300, likely: 395, high: 520 },
  ],
});

const sweep: SweepSettings = { vary: 'led-wide', tariff: { lo: 0.05, hi: 0.6, n: 60 }, efficacy: { lo: 0.6, hi: 1.6, n: 90 } };

describe('the sensitivity command handler', () => {
  it('gives the same uncertainty result for the same seed on two separate runs, and the engine’s whole-run result', async () => {
    const first = harness();
    const second = harness();
    await first.send({ type: 'uncertainty', job: 1, scenario: sixOptionInput(), settings: uncertainty(2024) });
    await second.send({ type: 'uncertainty', job: 9, scenario: sixOptionInput(), settings: uncertainty(2024) });
    const a = finished(first.replies);
    const b = finished(second.replies);
    expect(a.result).toEqual(b.result);
    expect(a.result).toEqual(runUncertainty(sixOptions(), uncertainty(2024)));
    const other = harness();
    await other.send({ type: 'uncertainty', job: 1, scenario: sixOptionInput(), settings: uncertainty(2025) });
    expect(finished(other.replies).result).not.toEqual(a.result);
  });

  it('reports progress that never falls and reaches 100 % before the result', async () => {
    const { replies, send } = harness();
    await send({ type: 'uncertainty', job: 3, scenario: sixOptionInput(), settings: uncertainty(7, 12_345) });
    const progress = replies.filter((r) => r.type === 'progress');
    expect(progress.length).toBeGreaterThan(10);
    const done = progress.map((r) => r.done);
    expect(done).toEqual([...done].sort((x, y) => x - y));
    expect(progress.at(-1)).toEqual({ type: 'progress', job: 3, done: 12_345, total: 12_345 });
    expect(finished(replies).job).toBe(3);
  });

  it('stops between chunks once cancelled: no chunk runs after the cancel and the reply says how far it got', async () => {
    let cancelledAt = -1;
    const { replies, send } = harness((r, sendCmd) => {
      if (r.type === 'progress' && r.done > 0 && cancelledAt < 0) {
        cancelledAt = r.done;
        void sendCmd({ type: 'cancel', job: 5 });
      }
    });
    await send({ type: 'uncertainty', job: 5, scenario: sixOptionInput(), settings: uncertainty(1, 1_000_000) });
    const last = replies.at(-1);
    expect(last).toEqual({ type: 'cancelled', job: 5, done: cancelledAt, total: 1_000_000 });
    expect(cancelledAt).toBeLessThan(1_000_000);
    expect(replies.filter((r) => r.type === 'progress' && r.done > cancelledAt)).toEqual([]);
  });

  it('lets a cancel sent from outside, on a later task, reach the run (the way a worker receives it)', async () => {
    const { replies, send } = harness();
    const running = send({ type: 'sweep', job: 2, scenario: sixOptionInput(), settings: { ...sweep, tariff: { lo: 0, hi: 1, n: 200 }, efficacy: { lo: 0.5, hi: 2, n: 200 } } });
    await new Promise((resolve) => setTimeout(resolve, 0));
    await send({ type: 'cancel', job: 2 });
    await running;
    const last = replies.at(-1);
    expect(last?.type).toBe('cancelled');
    if (last?.type === 'cancelled') expect(last.done).toBeLessThan(200);
  });

  it('gives the engine’s sweep, cell for cell, whatever the chunking', async () => {
    const { replies, send } = harness();
    await send({ type: 'sweep', job: 4, scenario: sixOptionInput(), settings: sweep });
    const reply = finished(replies);
    expect(reply.kind).toBe('sweep');
    expect(reply.result).toEqual(runSweep(sixOptions(), sweep));
    expect(replies.filter((r) => r.type === 'progress').length).toBeGreaterThan(2);
  });

  it('reports the break-even price the engine finds, with which option is cheaper at today’s price', async () => {
    const { replies, send } = harness();
    const s = sixOptions({ fixtureCount: 'exact' });
    await send({ type: 'breakeven', job: 6, scenario: s, settings: { a: 'old-sodium', b: 'led-wide' } });
    const reply = finished(replies);
    if (reply.kind !== 'breakeven') throw new Error('wrong kind');
    expect(reply.result.price).toEqual(breakevenPrice(s, { a: 'old-sodium', b: 'led-wide' }));
    expect(reply.result.currentPrice).toBe(0.24);
    expect(reply.result.efficacyB).toBeCloseTo(2.7, 12);
    expect(replies.filter((r) => r.type === 'progress').map((r) => r.done)).toEqual([0, 1, 2, 3]);
  });

  it('gives a mean present value at the triangular mean price when only the price is drawn (mean (a + b + c) / 3, variance (a² + b² + c² − ab − ac − bc) / 18: Evans, Hastings and Peacock, Statistical Distributions, 3rd ed., 2000)', async () => {
    const { replies, send } = harness();
    const settings: UncertaintySettings = { seed: 99, draws: 20_000, inputs: [{ path: 'electricity.pricePerKwh', low: 0.12, likely: 0.24, high: 0.45 }] };
    await send({ type: 'uncertainty', job: 1, scenario: sixOptionInput(), settings });
    const reply = finished(replies);
    if (reply.kind !== 'uncertainty') throw new Error('wrong kind');
    // PV is affine in the year-1 price, so its mean is PV at the mean price; the sample mean of 20,000
    // draws lies within 4 standard errors of the true mean.
    const [a, c, b] = [0.12, 0.24, 0.45];
    const sd = Math.sqrt((a * a + b * b + c * c - a * b - a * c - b * c) / 18);
    const meanPrice = triangularMean(a, c, b);
    const atMean = runSweep(sixOptions(), { vary: 'old-sodium', tariff: { lo: meanPrice, hi: meanPrice, n: 1 }, efficacy: { lo: 1, hi: 1, n: 1 } });
    const at0 = runSweep(sixOptions(), { vary: 'old-sodium', tariff: { lo: 0, hi: 0, n: 1 }, efficacy: { lo: 1, hi: 1, n: 1 } });
    for (const o of reply.result.options) {
      const expected = atMean.presentValue[o.id]![0]![0]!;
      const slope = (expected - at0.presentValue[o.id]![0]![0]!) / meanPrice;
      expect(Math.abs(o.mean - expected)).toBeLessThan(4 * slope * (sd / Math.sqrt(20_000)));
    }
  });

  it('answers settings the shared schemas refuse with every problem in plain words, and runs nothing', async () => {
    const { replies, send } = harness();
    await send({ type: 'sweep', job: 8, scenario: sixOptionInput(), settings: { vary: 'nope', tariff: { lo: 0.5, hi: 0.1, n: 20 }, efficacy: { lo: 1, hi: 2, n: 201 } } });
    expect(replies).toHaveLength(1);
    const r = replies[0]!;
    expect(r.type).toBe('invalid');
    if (r.type !== 'invalid') return;
    expect(r.source).toBe('settings');
    expect(r.problems).toEqual(expect.arrayContaining([
      { path: 'tariff.hi', message: 'must be at least LO (0.5)' },
      { path: 'efficacy.n', message: 'must be at most 200' },
    ]));
  });

  it('names the scenario as the source when the scenario itself does not validate', async () => {
    const { replies, send } = harness();
    await send({ type: 'swings', job: 1, scenario: { ...sixOptionInput(), utilization: 2 }, settings: { pct: 20 } });
    const r = replies[0]!;
    expect(r.type === 'invalid' && r.source === 'scenario' && r.problems.some((p) => p.path === 'utilization')).toBe(true);
  });

  it('ranks swings largest first and covers every numeric input', async () => {
    const { replies, send } = harness();
    await send({ type: 'swings', job: 1, scenario: sixOptionInput(), settings: { pct: 20 } });
    const reply = finished(replies);
    if (reply.kind !== 'swings') throw new Error('wrong kind');
    const sizes = reply.result.rows.map((r) => r.size);
    expect(sizes).toEqual([...sizes].sort((x, y) => y - x));
    expect(reply.result.rows.length + reply.result.invalid.length).toBe(replies.filter((r) => r.type === 'progress').at(-1)!.total);
  });
});
