import fc from 'fast-check';
import { pv as annuityPv } from 'financial';
import type { OptionInput, Scenario, ScenarioInput } from '../../src/contracts/scenario';
import { parseScenario } from '../../src/engine';

/** Parses a scenario for a test, failing with every problem when it is invalid. */
export function parsed(input: ScenarioInput): Scenario {
  const checked = parseScenario(input);
  if (!checked.ok) throw new Error(checked.problems.map((p) => `${p.path}: ${p.message}`).join('\n'));
  return checked.value;
}

/** Six invented options (made-up figures, no real products): lamps, lampless, efficacy and ppf, owned and bought. */
export const SIX_OPTIONS: OptionInput[] = [
  { id: 'old-sodium', label: 'Installed sodium fixture', technology: 'hps', wallWatts: 640, photonEfficacy: 1.1, owned: true,
    lamp: { price: '41.20', replaceEveryHours: 10000, outputAtReplacementPct: 86 } },
  { id: 'new-sodium', label: 'New sodium fixture', technology: 'hps', wallWatts: 1050, photonEfficacy: 1.7, fixturePrice: '395',
    installPrice: '55', lamp: { price: '64', replaceEveryHours: 12000, outputAtReplacementPct: 90 } },
  { id: 'ceramic', label: 'Ceramic metal halide fixture', technology: 'cmh', wallWatts: 330, photonEfficacy: 1.6, fixturePrice: '310',
    installPrice: '40', lamp: { price: '79.90', replaceEveryHours: 15000, outputAtReplacementPct: 84 } },
  { id: 'led-wide', label: 'Wide LED fixture', technology: 'led', wallWatts: 660, photonEfficacy: 2.7, fixturePrice: '880',
    installPrice: '60', rebate: '110', outputAtHorizonPct: 93 },
  { id: 'led-ppf', label: 'LED fixture rated by PPF', technology: 'led', wallWatts: 420, ppf: 1050, fixturePrice: '610',
    installPrice: '60', outputAtHorizonPct: 91 },
  { id: 'tubes', label: 'Fluorescent tube fixture', technology: 'fluorescent', wallWatts: 230, photonEfficacy: 0.95, fixturePrice: '120',
    lamp: { price: '36', replaceEveryHours: 9000, outputAtReplacementPct: 80 } },
];

/** A fictional room with the six options over 10 years; every field overridable. */
export function sixOptionInput(over: Partial<ScenarioInput> = {}): ScenarioInput {
  return {
    format: 'photon-parity/scenario@1',
    title: 'Test room with six options',
    currency: 'EUR',
    canopy: { lengthM: 9, widthM: 6 },
    target: { ppfd: 750 },
    schedule: [{ label: 'veg', hoursPerDay: 18, daysPerYear: 60 }, { label: 'flower', hoursPerDay: 12, daysPerYear: 280 }],
    utilization: 0.86,
    levelAt: 'maintained',
    fixtureCount: 'exact',
    horizonYears: 10,
    discountRatePct: 5,
    electricity: { pricePerKwh: '0.24', escalationPctPerYear: 2.5, demandChargePerKwMonth: '3.80' },
    cooling: { cop: 3.1, share: 0.85 },
    baseline: 'old-sodium',
    options: SIX_OPTIONS,
    ...over,
  };
}

/** The six-option room, parsed. */
export const sixOptions = (over: Partial<ScenarioInput> = {}): Scenario => parsed(sixOptionInput(over));

/** Random variations of the six-option room: price, escalation, discount, horizon, counting and leveling. */
export const roomArb: fc.Arbitrary<Scenario> = fc
  .record({
    price: fc.integer({ min: 1, max: 9000 }).map((c) => (c / 10000).toFixed(4)),
    escalation: fc.double({ min: -5, max: 8, noNaN: true }),
    discount: fc.double({ min: 0, max: 12, noNaN: true }),
    demand: fc.integer({ min: 0, max: 1500 }).map((c) => (c / 100).toFixed(2)),
    horizon: fc.integer({ min: 1, max: 20 }),
    fixtureCount: fc.constantFrom('exact' as const, 'whole' as const),
    levelAt: fc.constantFrom('initial' as const, 'maintained' as const),
    utilization: fc.double({ min: 0.5, max: 1, noNaN: true }),
    cooling: fc.boolean(),
  })
  .map((r) =>
    sixOptions({
      electricity: { pricePerKwh: r.price, escalationPctPerYear: r.escalation, demandChargePerKwMonth: r.demand },
      discountRatePct: r.discount,
      horizonYears: r.horizon,
      fixtureCount: r.fixtureCount,
      levelAt: r.levelAt,
      utilization: r.utilization,
      ...(r.cooling ? {} : { cooling: undefined }),
    }),
  );

/** The scenario with another year-1 price and option `index`'s photon output multiplied by `factor`. */
export function withPriceAndFactor(s: Scenario, price: number, index: number, factor: number): Scenario {
  return {
    ...s,
    electricity: { ...s.electricity, pricePerKwh: String(price) },
    options: s.options.map((o, i) => {
      if (i !== index) return o;
      return o.ppf !== undefined ? { ...o, ppf: o.ppf * factor } : { ...o, photonEfficacy: (o.photonEfficacy ?? 0) * factor };
    }),
  };
}

/** |a − b| / max(|a|, |b|, 1) */
export const relDiff = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1);

/** The scenario with one field (by Problem-style path) replaced, copying only along the path. */
export function pathKeysForTest<T>(root: T, path: string, value: unknown): T {
  const keys = (path.match(/[^.[\]]+/g) ?? []).map((k) => (/^\d+$/.test(k) ? Number(k) : k));
  const put = (node: unknown, at: number): unknown => {
    if (at === keys.length) return value;
    const k = keys[at]!;
    if (Array.isArray(node)) return node.map((x, i) => (i === k ? put(x, at + 1) : x));
    const rec = node as Record<string, unknown>;
    return { ...rec, [k]: put(rec[k], at + 1) };
  };
  return put(root, 0) as T;
}

/** A lampless LED option at a flat price, for rooms whose present values have a closed form. */
export const lampless = (id: string, wallWatts: number, photonEfficacy: number, fixturePrice: string): OptionInput =>
  ({ id, label: id, technology: 'led', wallWatts, photonEfficacy, fixturePrice });

/**
 * Two lampless options ("cheap": 1.5 µmol/J at 250 each, "frugal": 2.8 µmol/J at 900 each) in a 50 m²
 * room at 600 µmol m⁻² s⁻¹, exact counts, level prices, 6 % over 8 years, 0.2 per kWh: PV = n × price
 * + E × tariff × AF, with AF the uniform present value factor (NIST Handbook 135, Fuller and
 * Petersen 1996) = −pv(0.06, 8, 1), pv from the financial package (a port of numpy-financial).
 */
export function annuityRoom(): { scenario: Scenario; af: number; count: (eff: number) => number; kwh: (eff: number) => number } {
  const scenario = sixOptions({
    canopy: { lengthM: 10, widthM: 5 }, target: { ppfd: 600 }, schedule: [{ label: 'lit', hoursPerDay: 12, daysPerYear: 360 }],
    utilization: 1, levelAt: 'initial', fixtureCount: 'exact', horizonYears: 8, discountRatePct: 6,
    electricity: { pricePerKwh: '0.2', escalationPctPerYear: 0, demandChargePerKwMonth: '0' }, cooling: undefined,
    baseline: 'cheap', options: [lampless('cheap', 600, 1.5, '250'), lampless('frugal', 600, 2.8, '900')],
  });
  const count = (eff: number) => (600 * 50) / (eff * 600);
  return { scenario, af: -annuityPv(0.06, 8, 1), count, kwh: (eff) => (count(eff) * 600 * 12 * 360) / 1000 };
}
