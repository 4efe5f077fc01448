import { readFileSync, readdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { uncertaintySettingsSchema } from '../../src/contracts/sensitivity';
import { checkUncertaintySettings, parseScenario, planUncertainty, runUncertainty, summarizeUncertainty, uncertaintyDraws } from '../../src/engine';
import type { UncertaintySummary } from '../../src/engine';

/*
 * Pins cross-machine reproducibility of seeded uncertainty runs (issue 6.4: "the same seed gives the
 * same numbers on every machine"). The golden file was written once by
 * scripts/write-uncertainty-golden.ts; this test recomputes it and demands every number bit for bit,
 * not to a tolerance. It can hold on every machine because the run uses only IEEE 754 binary64
 * arithmetic (+ − × ÷, each rounded on its own, so no fused multiply-add) and functions that
 * ECMA-262 specifies exactly: Math.sqrt returns "𝔽(the square root of ℝ(n))" (ECMA-262 §21.3.2.32),
 * i.e. correctly rounded like IEEE 754-2019 §5.4.1 squareRoot, while exp, log, pow, sin and the
 * `**` operator are "implementation-approximated" and may differ in the last bit between engines
 * and platforms. The generator is integer arithmetic (Math.imul, 32-bit shifts, BigInt). The scan
 * below checks that the modules of the run keep to that. Money text becomes a number through
 * StringToNumber, which is 𝔽(value), correctly rounded, only up to 20 significant digits
 * (ECMA-262 §7.1.4.1.3 RoundMVResult); the demo scenario's amounts have at most 5.
 * JSON.stringify writes each double as the shortest text that reads back as the same double
 * (ECMA-262 §6.1.6.1.20 Number::toString), so the stored numbers are exact.
 */

interface Golden {
  scenario: string;
  engineVersion: string;
  settings: unknown;
  summary: UncertaintySummary;
}

const goldenFiles = readdirSync('scenarios/golden').filter((f) => f.endsWith('.uncertainty.json'));

function load(file: string) {
  const golden = JSON.parse(readFileSync(`scenarios/golden/${file}`, 'utf8')) as Golden;
  const checked = parseScenario(JSON.parse(readFileSync(`scenarios/${golden.scenario}`, 'utf8')));
  if (!checked.ok) throw new Error(`${golden.scenario} is invalid`);
  const settings = uncertaintySettingsSchema.parse(golden.settings);
  return { golden, scenario: checked.value, settings };
}

describe('uncertainty golden files', () => {
  it('has at least one golden uncertainty run', () => {
    expect(goldenFiles.length).toBeGreaterThan(0);
  });

  for (const file of goldenFiles) {
    it(`${file}: the stored seed and settings give exactly the stored chances and P10/P50/P90 (bit for bit)`, () => {
      const { golden, scenario, settings } = load(file);
      expect(checkUncertaintySettings(scenario, settings)).toEqual([]);
      const got = runUncertainty(scenario, settings);
      expect(got.seed).toBe(golden.summary.seed);
      expect(got.draws).toBe(golden.summary.draws);
      expect(got.options.map((o) => o.id)).toEqual(golden.summary.options.map((o) => o.id));
      got.options.forEach((o, i) => {
        const want = golden.summary.options[i]!;
        for (const key of ['chanceCheapest', 'p10', 'p50', 'p90', 'mean'] as const) {
          expect(Object.is(o[key], want[key]), `${o.id}.${key}: got ${o[key]}, stored ${want[key]}`).toBe(true);
        }
      });
    });

    it(`${file}: draws split into uneven chunks, as a worker runs them, give the same stored numbers`, () => {
      const { golden, scenario, settings } = load(file);
      const plan = planUncertainty(scenario, settings);
      const cuts = [0, 1, 777, 4096, 4097, 9001, settings.draws];
      const chunks = cuts.slice(1).map((to, i) => uncertaintyDraws(plan, cuts[i]!, to)).reverse();
      expect(summarizeUncertainty(plan, chunks)).toEqual(golden.summary);
    });

    it(`${file}: the stored run is not degenerate (chances add up to 1, quantiles in order, at least two options can win)`, () => {
      const { golden } = load(file);
      const options = golden.summary.options;
      expect(options.reduce((sum, o) => sum + o.chanceCheapest, 0)).toBeCloseTo(1, 12);
      expect(options.filter((o) => o.chanceCheapest > 0.05).length).toBeGreaterThanOrEqual(2);
      for (const o of options) expect(o.p10 < o.p50 && o.p50 < o.p90).toBe(true);
    });
  }
});

/** Math functions ECMA-262 specifies exactly (no "implementation-approximated" step). */
const EXACT_MATH = new Set(['sqrt', 'imul', 'floor', 'ceil', 'round', 'trunc', 'abs', 'sign', 'min', 'max', 'fround', 'clz32']);

/** Source files a module imports at run time (type-only imports left out), relative ones only. */
function runtimeImports(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const found: string[] = [];
  for (const m of text.matchAll(/^import\s+(type\s+)?[^'"]*from\s+'(\.[^']+)'/gm)) {
    if (m[1]) continue;
    const base = resolve(dirname(file), m[2]!);
    for (const candidate of [`${base}.ts`, join(base, 'index.ts')]) {
      try {
        readFileSync(candidate);
        found.push(candidate);
        break;
      } catch {
        // not this spelling of the module
      }
    }
  }
  return found;
}

function withoutComments(text: string): string {
  return text.replace(/\/\*[\s\S]*?\*\//g, '').replace(/(^|[^:'"`])\/\/.*$/gm, '$1');
}

describe('modules of a seeded uncertainty run', () => {
  it('use no Math function whose result ECMA-262 leaves to the platform, and no ** operator', () => {
    const seen = new Set<string>();
    const queue = [resolve('src/engine/sensitivity/uncertainty.ts')];
    while (queue.length) {
      const file = queue.pop()!;
      if (seen.has(file) || !file.includes(`${resolve('src/engine')}`)) continue;
      seen.add(file);
      queue.push(...runtimeImports(file));
    }
    const offending: string[] = [];
    for (const file of seen) {
      const code = withoutComments(readFileSync(file, 'utf8'));
      for (const m of code.matchAll(/Math\.([a-zA-Z0-9]+)/g)) if (!EXACT_MATH.has(m[1]!)) offending.push(`${file}: Math.${m[1]}`);
      if (/[^*/]\*\*[^*/]/.test(code)) offending.push(`${file}: **`);
    }
    expect([...seen].map((f) => f.replace(`${resolve('.')}/`, '')).sort()).toEqual(
      expect.arrayContaining(['src/engine/fast-path.ts', 'src/engine/sensitivity/prng.ts', 'src/engine/sensitivity/triangular.ts', 'src/engine/sensitivity/quantile.ts']),
    );
    expect(offending).toEqual([]);
  });
});
