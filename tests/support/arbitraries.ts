import fc from 'fast-check';
import type { OptionInput, ScenarioInput } from '../../src/contracts/scenario';

const money = (max: number) => fc.integer({ min: 0, max: max * 100 }).map((cents) => (cents / 100).toFixed(2));

/** Any valid option, with or without a lamp, efficacy or ppf, owned or bought. */
export const optionArb = (id: string): fc.Arbitrary<OptionInput> =>
  fc
    .record({
      wallWatts: fc.integer({ min: 50, max: 1200 }),
      photonEfficacy: fc.double({ min: 0.8, max: 3.5, noNaN: true }),
      owned: fc.boolean(),
      fixturePrice: money(2000),
      installPrice: money(200),
      rebate: money(100),
      lamp: fc.option(
        fc.record({ price: money(150), replaceEveryHours: fc.integer({ min: 2000, max: 30000 }), outputAtReplacementPct: fc.integer({ min: 60, max: 100 }) }),
        { nil: undefined },
      ),
      outputAtHorizonPct: fc.integer({ min: 70, max: 100 }),
    })
    .map((o) => ({ id, label: `option ${id}`, technology: o.lamp ? 'hps' : 'led', ...o }) as OptionInput);

/** Any valid scenario of 1 to 4 options. */
export const scenarioArb: fc.Arbitrary<ScenarioInput> = fc
  .record({
    lengthM: fc.double({ min: 1, max: 40, noNaN: true }),
    widthM: fc.double({ min: 1, max: 20, noNaN: true }),
    ppfd: fc.integer({ min: 100, max: 1500 }),
    hoursPerDay: fc.integer({ min: 8, max: 20 }),
    daysPerYear: fc.integer({ min: 100, max: 365 }),
    utilization: fc.double({ min: 0.5, max: 1, noNaN: true }),
    levelAt: fc.constantFrom('initial', 'maintained'),
    fixtureCount: fc.constantFrom('exact', 'whole'),
    horizonYears: fc.integer({ min: 1, max: 15 }),
    discountRatePct: fc.double({ min: 0, max: 12, noNaN: true }),
    price: money(1),
    escalation: fc.double({ min: 0, max: 8, noNaN: true }),
    demand: money(10),
    cooling: fc.option(fc.record({ cop: fc.double({ min: 1.5, max: 6, noNaN: true }), share: fc.double({ min: 0, max: 1, noNaN: true }) }), { nil: undefined }),
    options: fc.integer({ min: 1, max: 4 }).chain((n) => fc.tuple(...Array.from({ length: n }, (_, i) => optionArb(`o${i}`)))),
  })
  .map(
    (r): ScenarioInput => ({
      format: 'photon-parity/scenario@1',
      title: 'generated',
      currency: 'EUR',
      canopy: { lengthM: r.lengthM, widthM: r.widthM },
      target: { ppfd: r.ppfd },
      schedule: [{ label: 'lit', hoursPerDay: r.hoursPerDay, daysPerYear: r.daysPerYear }],
      utilization: r.utilization,
      levelAt: r.levelAt,
      fixtureCount: r.fixtureCount,
      horizonYears: r.horizonYears,
      discountRatePct: r.discountRatePct,
      electricity: { pricePerKwh: r.price === '0.00' ? '0.01' : r.price, escalationPctPerYear: r.escalation, demandChargePerKwMonth: r.demand },
      cooling: r.cooling,
      baseline: 'o0',
      options: r.options,
    }),
  );
