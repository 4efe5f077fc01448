import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { computeScenario } from '../../src/engine';
import { runCli } from '../support/run-cli';
import { baseInput, hpsOption, shippedScenario } from '../support/scenarios';

const dir = mkdtempSync(join(tmpdir(), 'pp-cli-'));
const file = (name: string, content: unknown) => {
  const path = join(dir, name);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content));
  return path;
};

describe('cli compute', () => {
  it('prints photon-parity/result@1 with --json, equal to the engine result', () => {
    const r = runCli(['compute', 'scenarios/room-a-relamp-or-replace.scenario.json', '--json']);
    expect(r.code).toBe(0);
    const printed = JSON.parse(r.stdout);
    expect(printed.format).toBe('photon-parity/result@1');
    expect(printed).toEqual(computeScenario(shippedScenario('room-a-relamp-or-replace.scenario.json')));
    expect(Object.keys(printed.options[0]).sort()).toEqual(
      ['id', 'fixturesExact', 'fixturesWhole', 'fixturesUsed', 'achievedPpfd', 'energyKwhPerYear', 'coolingKwhPerYear', 'capex', 'energyCost',
        'coolingCost', 'demandCost', 'lampCost', 'totalNominal', 'totalPresentValue', 'costPerMol', 'paybackYears', 'years'].sort(),
    );
  });

  it('prints a readable table without --json, marking the cheapest and the baseline', () => {
    const r = runCli(['compute', 'scenarios/room-b-new-build.scenario.json']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/led-strip-240 \*/);
    expect(r.stdout).toMatch(/t5-fluorescent \(baseline\)/);
    expect(r.stdout).toMatch(/lowest present value: led-strip-240/);
  });

  it('exits 2 with one line per problem, naming the field path, and no stack trace', () => {
    const path = file('bad.json', baseInput({ horizonYears: 0, options: [hpsOption({ photonEfficacy: -1 })] }));
    const r = runCli(['compute', path]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toEqual(['horizonYears: must be at least 1 year', 'options[0].photonEfficacy: must be greater than 0']);
    expect(r.stdout).toBe('');
  });

  it('exits 2 for a file that is not JSON, and for a missing file', () => {
    const notJson = runCli(['compute', file('broken.json', '{ "format": ')]);
    expect(notJson.code).toBe(2);
    expect(notJson.stderr).toMatch(/broken\.json: is not valid JSON/);
    expect(notJson.stderr).not.toMatch(/\n\s+at /);
    const missing = runCli(['compute', join(dir, 'nope.json')]);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/nope\.json: cannot be read \(no such file\)/);
  });

  it('exits 2 for an unknown flag or command', () => {
    expect(runCli(['compute', 'scenarios/room-b-new-build.scenario.json', '--jsn']).code).toBe(2);
    expect(runCli(['levelise']).code).toBe(2);
  });
});
