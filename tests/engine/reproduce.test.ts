import { describe, expect, it } from 'vitest';
import { computeScenario } from '../../src/engine';
import { compareResults } from '../../src/engine/reproduce';
import { shippedScenario } from '../support/scenarios';

const result = () => computeScenario(shippedScenario('room-a-relamp-or-replace.scenario.json'));

describe('reproduce check', () => {
  it('says a stored result reproduces when the engine gives the same figures', () => {
    const report = compareResults(result(), result());
    expect(report).toMatchObject({ reproduces: true, sameInputs: true, differences: [] });
  });

  it('names each differing figure with both values and both engine versions', () => {
    const stored = structuredClone(result());
    stored.engineVersion = '0.9.0';
    stored.options[1]!.totalPresentValue = '1.00';
    stored.options[0]!.years[2]!.energy = '12';
    const report = compareResults(stored, result());
    expect(report.reproduces).toBe(false);
    expect(report.storedEngineVersion).toBe('0.9.0');
    expect(report.currentEngineVersion).toBe(result().engineVersion);
    expect(report.differences.map((d) => d.path)).toEqual(['options[0].years[2].energy', 'options[1].totalPresentValue']);
    expect(report.differences[1]).toMatchObject({ stored: '1.00', recomputed: result().options[1]!.totalPresentValue });
  });

  it('ignores float noise in plain-number figures but not in money', () => {
    const stored = structuredClone(result());
    stored.options[0]!.fixturesExact *= 1 + 1e-15;
    expect(compareResults(stored, result()).reproduces).toBe(true);
    stored.options[0]!.capex = '0.0';
    expect(compareResults(stored, result()).reproduces).toBe(false);
  });
});
