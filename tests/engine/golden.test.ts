import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeScenario } from '../../src/engine';
import { shippedScenario } from '../support/scenarios';

const files = readdirSync(new URL('../../scenarios/', import.meta.url)).filter((f) => f.endsWith('.scenario.json'));

describe('golden results of the shipped scenarios', () => {
  it('ships at least the two demo rooms', () => {
    expect(files).toEqual(expect.arrayContaining(['room-a-relamp-or-replace.scenario.json', 'room-b-new-build.scenario.json']));
  });

  it.each(files)('recomputes %s exactly as its golden result', (file) => {
    const golden = JSON.parse(readFileSync(new URL(`../../scenarios/golden/${file.replace('.scenario.json', '.result.json')}`, import.meta.url), 'utf8'));
    expect(computeScenario(shippedScenario(file))).toEqual(golden);
  });

  it('agrees with a hand calculation of Room A, owned sodium, year 1', () => {
    const r = computeScenario(shippedScenario('room-a-relamp-or-replace.scenario.json'));
    const hps = r.options.find((o) => o.id === 'owned-hps-600')!;
    // Φ = 1.12 × 645 = 722.4 µmol/s; × U 0.88 × M 0.88 = 559.42656 µmol/s per fixture on the canopy
    // n = 800 × 40 / 559.42656 = 57.2019… → 58 whole fixtures
    expect(hps.fixturesExact).toBeCloseTo(32000 / 559.42656, 9);
    expect(hps.fixturesUsed).toBe(58);
    // 58 × 645 W × 3960 h = 148 143.6 kWh at 0.27 = 39 998.772; cooling 0.9 / 3.2 of that = 11 249.654625
    expect(hps.years[1]!.energy).toBe('39998.772');
    expect(hps.years[1]!.cooling).toBe('11249.654625');
    // demand 58 × 0.645 kW × 4.10 × 12 = 1840.572
    expect(hps.years[1]!.demand).toBe('1840.572');
    // 3960 h/year × 6 years = 23 760 h, relamp every 10 000 h → 2 sets (years 3 and 6) of 58 × 38.50
    expect(hps.years.map((y) => y.lamps)).toEqual(['0', '0', '0', '2233', '0', '0', '2233']);
    expect(hps.capex).toBe('0');
  });
});
