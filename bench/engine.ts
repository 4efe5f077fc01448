import { readFileSync } from 'node:fs';
import type { ScenarioInput } from '../src/contracts/scenario';
import { compileFast, computeScenario, fastPresentValue, parseScenario } from '../src/engine';
import type { BenchSuite } from './types';
import { median, timeRuns } from './types';

/** A 6-option, 10-year scenario built from the shipped demo room A. */
export function sixOptionTenYearScenario() {
  const input = JSON.parse(readFileSync('scenarios/room-a-relamp-or-replace.scenario.json', 'utf8')) as ScenarioInput;
  const extra = input.options.slice(1, 3).map((o, i) => ({ ...o, id: `${o.id}-alt-${i}`, wallWatts: o.wallWatts * 1.1 }));
  const checked = parseScenario({ ...input, horizonYears: 10, options: [...input.options, ...extra] });
  if (!checked.ok) throw new Error('bench scenario is invalid');
  return checked.value;
}

export const engineSuite: BenchSuite = {
  name: 'engine',
  async run() {
    const s = sixOptionTenYearScenario();
    const ledgerMs = median(timeRuns(() => computeScenario(s), 400, 50));

    const fast = compileFast(s);
    const evaluations = 1_000_000;
    const n = fast.options.length;
    let sink = 0;
    const fastRun = () => {
      for (let i = 0; i < evaluations; i++) sink += fastPresentValue(fast, i % n, 0.2 + (i % 97) * 0.001, 1);
    };
    const fastMs = median(timeRuns(fastRun, 7, 2));

    // The same float arithmetic written as one bare loop over pre-extracted numbers: the floor the fast path is compared to.
    const o = fast.options.map((x) => [x.canopyFluxPerFixture, x.wallWatts, x.owned ? 0 : x.unitCapex, x.lampPrice] as const);
    const bareRun = () => {
      for (let i = 0; i < evaluations; i++) {
        const [flux, watts, unit, lamp] = o[i % n]!;
        const price = 0.2 + (i % 97) * 0.001;
        const exact = fast.neededFlux / flux;
        const used = fast.whole ? Math.ceil(exact - 1e-9) : exact;
        const kw = (used * watts) / 1000;
        const kwh = kw * fast.hours * fast.energyWithCooling;
        const demand = kw * fast.demandPerKwYear;
        const reps = fast.options[i % n]!.replacements;
        let pv = used * unit;
        for (let t = 1; t <= fast.horizon; t++) pv += (kwh * price * fast.priceGrowth[t]! + demand + used * lamp * reps[t]!) * fast.discount[t]!;
        sink += pv;
      }
    };
    const bareMs = median(timeRuns(bareRun, 7, 2));
    if (sink === 42) process.stdout.write('');

    return [
      { name: 'ledger (decimal): 6 options × 10 years, median of 400', value: ledgerMs, unit: 'ms', target: 2, direction: 'below' },
      {
        name: 'fast path: 1,000,000 option-evaluations (6 options, 10 years)',
        value: evaluations / (fastMs / 1000),
        unit: 'evaluations/s',
        target: 5_000_000,
        direction: 'above',
        note: `${fastMs.toFixed(1)} ms; ${(fastMs / bareMs).toFixed(2)}× a bare float loop (${bareMs.toFixed(1)} ms)`,
      },
    ];
  },
};
