import { readFileSync } from 'node:fs';
import type { OptionInput, Scenario, ScenarioInput } from '../../src/contracts/scenario';
import { parseScenario } from '../../src/engine';

/** Parses a scenario for a test, failing loudly with every problem if it is invalid. */
export function scenario(input: ScenarioInput): Scenario {
  const checked = parseScenario(input);
  if (!checked.ok) throw new Error(checked.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return checked.value;
}

/** Reads one of the shipped scenario files. */
export function shippedScenario(name: string): Scenario {
  return scenario(JSON.parse(readFileSync(new URL(`../../scenarios/${name}`, import.meta.url), 'utf8')) as ScenarioInput);
}

/** A lampless option with round numbers, overridable per test. */
export function ledOption(over: Partial<OptionInput> = {}): OptionInput {
  return { id: 'led', label: 'LED test fixture', technology: 'led', wallWatts: 600, photonEfficacy: 2.5, fixturePrice: '800', ...over };
}

/** A sodium option with a lamp, overridable per test. */
export function hpsOption(over: Partial<OptionInput> = {}): OptionInput {
  return {
    id: 'hps',
    label: 'Sodium test fixture',
    technology: 'hps',
    wallWatts: 640,
    photonEfficacy: 1.2,
    fixturePrice: '300',
    lamp: { price: '40', replaceEveryHours: 10000, outputAtReplacementPct: 80 },
    ...over,
  };
}

/** A small valid scenario with two options; every field overridable. */
export function baseInput(over: Partial<ScenarioInput> = {}): ScenarioInput {
  return {
    format: 'photon-parity/scenario@1',
    title: 'Test room',
    currency: 'EUR',
    canopy: { lengthM: 5, widthM: 4 },
    target: { ppfd: 600 },
    schedule: [{ label: 'flower', hoursPerDay: 12, daysPerYear: 300 }],
    horizonYears: 5,
    electricity: { pricePerKwh: '0.25' },
    baseline: 'hps',
    options: [hpsOption(), ledOption()],
    ...over,
  };
}
