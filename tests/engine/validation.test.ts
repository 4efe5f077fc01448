import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../src/engine';
import { baseInput, hpsOption, ledOption } from '../support/scenarios';

const problems = (input: unknown) => {
  const r = parseScenario(input);
  return r.ok ? [] : r.problems.map((p) => `${p.path}: ${p.message}`);
};

describe('scenario validation', () => {
  it('accepts the base test scenario and fills in the defaults', () => {
    const r = parseScenario(baseInput());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.utilization).toBe(1);
    expect(r.value.levelAt).toBe('initial');
    expect(r.value.fixtureCount).toBe('exact');
    expect(r.value.discountRatePct).toBe(0);
    expect(r.value.electricity.demandChargePerKwMonth).toBe('0');
    expect(r.value.options[1]!.rebate).toBe('0');
    expect(r.value.options[1]!.outputAtHorizonPct).toBe(100);
  });

  it('names the field path and the rule: options[0].photonEfficacy must be greater than 0', () => {
    expect(problems(baseInput({ options: [hpsOption({ photonEfficacy: 0 })] }))).toEqual(['options[0].photonEfficacy: must be greater than 0']);
  });

  it('reports every problem at once, not just the first', () => {
    const found = problems(baseInput({ horizonYears: 0, utilization: 1.5, canopy: { lengthM: -1, widthM: 4 }, electricity: { pricePerKwh: 'cheap' } }));
    expect(found).toEqual(
      expect.arrayContaining([
        'horizonYears: must be at least 1 year',
        'utilization: must be at most 1',
        'canopy.lengthM: must be greater than 0',
        'electricity.pricePerKwh: must be a plain decimal amount such as "249.90"',
      ]),
    );
    expect(found).toHaveLength(4);
  });

  it('refuses unknown fields by name, so a misspelt field is not silently ignored', () => {
    expect(problems({ ...baseInput(), utilisation: 0.9 })).toEqual(['utilisation: is not a known field (check its spelling)']);
  });

  it('needs exactly one of photonEfficacy and ppf', () => {
    expect(problems(baseInput({ options: [hpsOption({ ppf: 700 })] }))).toEqual(['options[0].photonEfficacy: give photonEfficacy or ppf, not both']);
    expect(problems(baseInput({ options: [hpsOption({ photonEfficacy: undefined })] }))).toEqual([
      'options[0].photonEfficacy: give photonEfficacy (µmol/J) or ppf (µmol/s)',
    ]);
  });

  it('refuses an efficacy above the physical limit for 400–700 nm photons (about 5.85 µmol/J)', () => {
    // λ / (h c N_A) at 700 nm with the CODATA 2018 exact constants = 5.8515 µmol/J
    const limit = 700e-9 / (6.62607015e-34 * 299792458 * 6.02214076e23) * 1e6;
    expect(limit).toBeCloseTo(5.8515, 3);
    expect(problems(baseInput({ options: [hpsOption({ photonEfficacy: 6 })] }))[0]).toMatch(/^options\[0\]\.photonEfficacy: must be at most 5.85/);
  });

  it('requires unique option ids and a baseline that names one of them', () => {
    expect(problems(baseInput({ baseline: 'nope', options: [ledOption(), ledOption()] }))).toEqual([
      'options[1].id: repeats the id "led"; ids must be unique',
      'baseline: must be the id of one of the options (no option "nope")',
    ]);
  });

  it('needs a fixture price unless the option is owned', () => {
    expect(problems(baseInput({ options: [hpsOption({ fixturePrice: undefined }), ledOption()] }))).toEqual([
      'options[0].fixturePrice: is required unless the option is owned',
    ]);
    expect(problems(baseInput({ options: [hpsOption({ fixturePrice: undefined, owned: true }), ledOption()] }))).toEqual([]);
  });

  it('ties a DLI target to a single growth phase', () => {
    const two = [{ label: 'veg', hoursPerDay: 18, daysPerYear: 100 }, { label: 'flower', hoursPerDay: 12, daysPerYear: 200 }];
    expect(problems(baseInput({ target: { dli: 30 }, schedule: two }))).toEqual([
      'target.dli: a DLI target needs exactly one growth phase, whose hours per day set the photoperiod',
    ]);
    expect(problems(baseInput({ target: { dli: 30, ppfd: 600 } }))).toEqual(['target: give ppfd or dli, exactly one of them']);
  });

  it('keeps the growth phases within one year', () => {
    const rows = [{ label: 'a', hoursPerDay: 12, daysPerYear: 200 }, { label: 'b', hoursPerDay: 12, daysPerYear: 200 }];
    expect(problems(baseInput({ schedule: rows }))).toEqual(['schedule: the phases add up to 400 days; a year has at most 366']);
  });

  it('keeps money exact: "249.90" and 249.9 both become the text "249.9", negatives are refused', () => {
    const r = parseScenario(baseInput({ options: [hpsOption({ fixturePrice: '0249.90' }), ledOption({ fixturePrice: 249.9 })] }));
    expect(r.ok && r.value.options.map((o) => o.fixturePrice)).toEqual(['249.9', '249.9']);
    expect(problems(baseInput({ options: [hpsOption({ rebate: '-5' }), ledOption()] }))).toEqual(['options[0].rebate: must not be negative']);
    expect(problems(baseInput({ options: [hpsOption({ rebate: '1e3' }), ledOption()] }))).toEqual([
      'options[0].rebate: must be a plain decimal amount such as "249.90"',
    ]);
  });

  it('says "is required" for missing sections and what was expected for wrong types', () => {
    expect(problems({ format: 'photon-parity/scenario@1' })).toEqual(
      expect.arrayContaining(['title: is required', 'canopy: is required', 'options: is required']),
    );
    expect(problems(baseInput({ horizonYears: '5' as unknown as number }))).toEqual(['horizonYears: must be a whole number of years']);
    expect(problems('not an object')).toEqual(['(file): must be a group of fields ({ … })']);
  });
});
