import { describe, expect, it } from 'vitest';
import { computeScenario, replacementsByYear } from '../../src/engine';
import { baseInput, hpsOption, ledOption, scenario } from '../support/scenarios';

const run = (input: Parameters<typeof baseInput>[0]) => computeScenario(scenario(baseInput(input)));
// 8 LED fixtures × 600 W in the default room: 4.8 kW over 3600 lit hours = 17 280 kWh per year.
const ledOnly = { baseline: 'led', options: [ledOption()] };

describe('ledger', () => {
  it('prices energy per year as n × P × H / 1000 kWh at the tariff', () => {
    const o = run(ledOnly).options[0]!;
    expect(o.energyKwhPerYear).toBeCloseTo(17280, 9);
    expect(o.years[1]!.energy).toBe('4320');
    expect(o.energyCost).toBe('21600');
  });

  it('escalates the tariff from year 2 on: price in year t is p × (1 + e)^(t−1)', () => {
    const o = run({ ...ledOnly, electricity: { pricePerKwh: '0.25', escalationPctPerYear: 10 } }).options[0]!;
    expect(o.years.map((y) => y.energy)).toEqual(['0', '4320', '4752', '5227.2', '5749.92', '6324.912']);
  });

  it('adds cooling energy E × share / COP, priced like lighting energy', () => {
    const o = run({ ...ledOnly, cooling: { cop: 3, share: 0.75 } }).options[0]!;
    expect(o.coolingKwhPerYear).toBeCloseTo(4320, 9);
    expect(o.years[1]!.cooling).toBe('1080');
  });

  it('charges demand as n × P / 1000 × charge × 12 each year, without escalation', () => {
    const o = run({ ...ledOnly, electricity: { pricePerKwh: '0.25', escalationPctPerYear: 5, demandChargePerKwMonth: '2.5' } }).options[0]!;
    expect(o.years.slice(1).map((y) => y.demand)).toEqual(['144', '144', '144', '144', '144']);
    expect(o.demandCost).toBe('720');
  });

  it('puts capital at year 0 as n × (fixture + install − rebate)', () => {
    const o = run({ ...ledOnly, options: [ledOption({ installPrice: '50', rebate: '120.50' })] }).options[0]!;
    expect(o.capex).toBe('5836'); // 8 × 729.5
    expect(o.years[0]!.total).toBe('5836');
    expect(o.years[0]!.cumulative).toBe('5836');
  });

  it('buys a fractional count when fixtureCount is exact', () => {
    const o = run({ ...ledOnly, options: [ledOption({ photonEfficacy: 2.4, fixturePrice: '1440' })] }).options[0]!;
    expect(Number(o.capex)).toBeCloseTo((12000 / 1440) * 1440, 9);
  });

  it('has no capital for owned fixtures but still pays their relamping', () => {
    const o = run({ options: [hpsOption({ owned: true, fixturePrice: undefined }), ledOption()] }).options[0]!;
    expect(o.capex).toBe('0');
    expect(Number(o.lampCost)).toBeGreaterThan(0);
  });

  it('relamps each time lit hours reach the interval strictly before the horizon ends', () => {
    // 3600 h/year for 5 years = 18 000 h; every 4000 h → ⌈4.5⌉ − 1 = 4 replacements at 4000, 8000, 12 000, 16 000 h
    expect(replacementsByYear(3600, 5, 4000)).toEqual([0, 0, 1, 1, 1, 1]);
    // exactly at the horizon's end is not a replacement: 3 years × 3600 = 10 800 h, interval 10 800 h
    expect(replacementsByYear(3600, 3, 10800)).toEqual([0, 0, 0, 0]);
    // an interval shorter than a year replaces more than once a year
    expect(replacementsByYear(3600, 2, 1500)).toEqual([0, 2, 2]);
  });

  it('prices each replacement as n × lamp price in the year it falls', () => {
    const input = { baseline: 'hps', options: [hpsOption({ lamp: { price: '40', replaceEveryHours: 4000, outputAtReplacementPct: 80 } })] };
    const o = run(input).options[0]!;
    const n = o.fixturesUsed;
    expect(o.years.map((y) => Number(y.lamps))).toEqual([0, 0, 40 * n, 40 * n, 40 * n, 40 * n].map((v) => expect.closeTo(v, 9)));
    expect(Number(o.lampCost)).toBeCloseTo(160 * n, 9);
  });

  it('sums the nominal total and keeps money exact in decimals (no binary float drift)', () => {
    const o = run({ ...ledOnly, electricity: { pricePerKwh: '0.1' }, options: [ledOption({ fixturePrice: '0.1', installPrice: '0.2' })] }).options[0]!;
    // 8 × 0.3 = 2.4 exactly, where 8 × (0.1 + 0.2) in floats is 2.4000000000000004
    expect(o.capex).toBe('2.4');
    expect(o.totalNominal).toBe('8642.4');
  });

  it('gives cost per mol = PV / (achieved PPFD × A × H × 3600 × N / 10⁶)', () => {
    const o = run(ledOnly).options[0]!;
    const mol = (600 * 20 * 3600 * 3600 * 5) / 1e6;
    expect(Number(o.costPerMol)).toBeCloseTo(Number(o.totalPresentValue) / mol, 15);
  });

  it('names the option with the lowest present value as cheapest, the first on a tie', () => {
    const r = run({});
    const pvs = r.options.map((o) => Number(o.totalPresentValue));
    expect(r.cheapest).toBe(r.options[pvs.indexOf(Math.min(...pvs))]!.id);
    const tie = run({ baseline: 'a', options: [ledOption({ id: 'a' }), ledOption({ id: 'b' })] });
    expect(tie.cheapest).toBe('a');
  });

  it('has one ledger row per year from 0 to N', () => {
    const o = run({ horizonYears: 12 }).options[0]!;
    expect(o.years.map((y) => y.year)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
  });
});
