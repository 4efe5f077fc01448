import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { breakevenPrice, runSweep } from '../../src/engine';
import { sixOptionInput, sixOptions } from './fixtures';

const file = join(mkdtempSync(join(tmpdir(), 'pp-sens-')), 'room.json');
writeFileSync(file, JSON.stringify(sixOptionInput()));
const cli = (...args: string[]) => spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], { encoding: 'utf8', cwd: process.cwd() });

describe('photon-parity CLI: sweep and breakeven', () => {
  it('sweep --json prints exactly photon-parity/sweep@1, equal to the engine’s result', () => {
    const run = cli('sweep', file, '--vary', 'led-wide', '--tariff', '0.1:0.5:5', '--efficacy', '0.8:1.4:4', '--json');
    expect(run.status).toBe(0);
    const doc = JSON.parse(run.stdout) as Record<string, unknown>;
    expect(Object.keys(doc)).toEqual(['format', 'vary', 'tariffs', 'efficacyFactors', 'winner', 'presentValue']);
    const settings = { vary: 'led-wide', tariff: { lo: 0.1, hi: 0.5, n: 5 }, efficacy: { lo: 0.8, hi: 1.4, n: 4 } };
    expect(doc).toEqual(runSweep(sixOptions(), settings));
  });

  it('sweep exits 2 with one line per problem for bad ranges and ids', () => {
    const run = cli('sweep', file, '--vary', 'nope', '--tariff', '0.5:0.1:3', '--efficacy', 'a:b');
    expect(run.status).toBe(2);
    expect(run.stdout).toBe('');
    expect(run.stderr.trim().split('\n')).toEqual([
      '--tariff HI: must be at least LO (0.5)',
      '--efficacy: must be LO:HI:N, three numbers such as 0.10:0.40:31',
      '--vary: names no option of this scenario (ids: old-sodium, new-sodium, ceramic, led-wide, led-ppf, tubes)',
    ]);
  });

  it('breakeven --json prints exactly photon-parity/breakeven@1, and exits 2 for an unknown option', () => {
    const run = cli('breakeven', file, 'old-sodium', 'led-wide', '--json');
    expect(run.status).toBe(0);
    const doc = JSON.parse(run.stdout) as Record<string, unknown>;
    expect(Object.keys(doc)).toEqual(['format', 'a', 'b', 'pricePerKwh']);
    expect(doc).toEqual({ format: 'photon-parity/breakeven@1', a: 'old-sodium', b: 'led-wide', pricePerKwh: breakevenPrice(sixOptions(), { a: 'old-sodium', b: 'led-wide' }).pricePerKwh });
    const bad = cli('breakeven', file, 'old-sodium', 'nope');
    expect(bad.status).toBe(2);
    expect(bad.stderr.trim()).toBe('B: names no option of this scenario (ids: old-sodium, new-sodium, ceramic, led-wide, led-ppf, tubes)');
  });
});
