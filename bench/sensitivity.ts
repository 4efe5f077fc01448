import type { UncertaintySettings } from '../src/contracts/sensitivity';
import type { FastScenario } from '../src/engine';
import { compileFast, runSweep, runUncertainty, seedXoshiro128, triangularQuantile, unitInterval, xoshiro128ssNext } from '../src/engine';
import { sixOptionTenYearScenario } from './engine';
import type { BenchRow, BenchSuite } from './types';
import { median, timeRuns } from './types';

/** PV of one option in plain float arithmetic, inlined: the floor the engine is compared to. */
function barePv(fast: FastScenario, i: number, price: number, factor: number): number {
  const o = fast.options[i]!;
  const exact = fast.neededFlux / (o.canopyFluxPerFixture * factor);
  const used = fast.whole ? Math.ceil(exact - 1e-9) : exact;
  const kw = (used * o.wallWatts) / 1000;
  const kwh = kw * fast.hours * fast.energyWithCooling;
  const demand = kw * fast.demandPerKwYear;
  let pv = o.owned ? 0 : used * o.unitCapex;
  for (let t = 1; t <= fast.horizon; t++) pv += (kwh * price * fast.priceGrowth[t]! + demand + used * o.lampPrice * o.replacements[t]!) * fast.discount[t]!;
  return pv;
}

const drawnInputs = (s: ReturnType<typeof sixOptionTenYearScenario>): UncertaintySettings['inputs'] => [
  { path: 'electricity.pricePerKwh', low: 0.15, likely: Number(s.electricity.pricePerKwh), high: 0.45 },
  { path: 'electricity.escalationPctPerYear', low: 0, likely: 2, high: 6 },
  { path: 'discountRatePct', low: 2, likely: 4, high: 8 },
  { path: 'cooling.cop', low: 2.5, likely: 3.2, high: 4 },
  { path: 'options[2].photonEfficacy', low: 2.3, likely: 2.65, high: 2.9 },
  { path: 'options[3].photonEfficacy', low: 2.0, likely: 2.35, high: 2.6 },
  { path: 'options[1].fixturePrice', low: 250, likely: 289, high: 340 },
];

export const sensitivitySuite: BenchSuite = {
  name: 'sensitivity',
  async run(): Promise<BenchRow[]> {
    const s = sixOptionTenYearScenario();
    const fast = compileFast(s);
    const n = fast.options.length;
    const vary = 2;
    const sweep = { vary: s.options[vary]!.id, tariff: { lo: 0.05, hi: 0.6, n: 200 }, efficacy: { lo: 0.6, hi: 1.8, n: 200 } };
    let sink = 0;
    const sweepMs = median(timeRuns(() => { sink += runSweep(s, sweep).tariffs.length; }, 15, 5));
    // The same evaluations the sweep makes: 200 × 200 for the varied option, 200 for each other one.
    const bareSweepMs = median(timeRuns(() => {
      for (let t = 0; t < 200; t++) {
        const price = 0.05 + (0.55 * t) / 199;
        for (let i = 0; i < n; i++) if (i !== vary) sink += barePv(fast, i, price, 1);
        for (let e = 0; e < 200; e++) sink += barePv(fast, vary, price, 0.6 + (1.2 * e) / 199);
      }
    }, 15, 5));

    const settings: UncertaintySettings = { seed: 2024, draws: 10_000, inputs: drawnInputs(s) };
    const drawsMs = median(timeRuns(() => { sink += runUncertainty(s, settings).draws; }, 9, 3));
    const allInputs: UncertaintySettings = { ...settings, inputs: [...settings.inputs, { path: 'schedule[0].hoursPerDay', low: 11, likely: 12, high: 12.5 }] };
    const drawsAllMs = median(timeRuns(() => { sink += runUncertainty(s, allInputs).draws; }, 9, 3));
    // The same draws and present values as one bare loop: triangular values, then 6 PVs per draw.
    const bareDrawsMs = median(timeRuns(() => {
      const g = seedXoshiro128(2024);
      const pvs = new Float64Array(10_000 * n);
      for (let k = 0; k < 10_000; k++) {
        let price = 0;
        for (const r of settings.inputs) price = triangularQuantile(unitInterval(xoshiro128ssNext(g)), r.low, r.likely, r.high);
        for (let i = 0; i < n; i++) pvs[k * n + i] = barePv(fast, i, price, 1);
      }
      for (let i = 0; i < n; i++) sink += pvs.subarray(0, 10).sort()[0]!;
    }, 9, 3));
    if (sink === 42) process.stdout.write('');

    const ratio = (ms: number, bare: number) => `${(ms / bare).toFixed(1)}× a bare float loop (${bare.toFixed(2)} ms)`;
    return [
      { name: 'sweep: 200 × 200, 6 options × 10 years, median', value: sweepMs, unit: 'ms', target: 150, direction: 'below', note: ratio(sweepMs, bareSweepMs) },
      { name: 'uncertainty: 10,000 draws of 7 inputs, 6 options × 10 years', value: drawsMs, unit: 'ms', target: 300, direction: 'below', note: ratio(drawsMs, bareDrawsMs) },
      { name: 'uncertainty: same + lit hours drawn (every option recompiled)', value: drawsAllMs, unit: 'ms', note: ratio(drawsAllMs, bareDrawsMs) },
    ];
  },
};
