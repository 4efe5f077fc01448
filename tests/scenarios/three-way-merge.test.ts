import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { optionSchema, scenarioSchema } from '../../src/contracts/scenario';
import type { Scenario } from '../../src/contracts/scenario';
import { starterScenario } from '../../src/features/scenarios/starter';
import { mergedScenario } from '../../src/features/scenarios/merge/merged-scenario';
import { sideChanges } from '../../src/features/scenarios/merge/side-changes';
import { settle, threeWayMerge } from '../../src/features/scenarios/merge/three-way-merge';

// Invented figures (demo-style placeholders), not data about any product.
const base: Scenario = scenarioSchema.parse({
  ...starterScenario('Test room', 'EUR'),
  baseline: 'sodium',
  options: [
    { id: 'sodium', label: 'Sodium, owned', technology: 'hps', wallWatts: 640, photonEfficacy: 1.1, owned: true },
    { id: 'bar', label: 'LED bar', technology: 'led', wallWatts: 600, photonEfficacy: 2.8, fixturePrice: '1200' },
  ],
});
const edit = (doc: Scenario, change: (d: Scenario) => void): Scenario => {
  const copy = structuredClone(doc);
  change(copy);
  return scenarioSchema.parse(copy);
};
const added = optionSchema.parse({ id: 'panel', label: 'LED panel', technology: 'led', wallWatts: 400, photonEfficacy: 2.5, fixturePrice: '700' });

describe('threeWayMerge of scenarios', () => {
  it('combines a demand charge set by them with a price typed by me, and the result is a valid scenario', () => {
    const theirs = edit(base, (d) => (d.electricity.demandChargePerKwMonth = '2.5'));
    const mine = edit(base, (d) => (d.electricity.pricePerKwh = '0.31'));
    const merge = threeWayMerge(base, mine, theirs);
    expect(merge.clashes).toEqual([]);
    const checked = mergedScenario(merge, {});
    expect(checked.ok && checked.value.electricity).toEqual({ pricePerKwh: '0.31', escalationPctPerYear: 0, demandChargePerKwMonth: '2.5' });
  });

  it('reports a field both changed to different values, and settles it either way', () => {
    const theirs = edit(base, (d) => (d.electricity.pricePerKwh = '0.25'));
    const mine = edit(base, (d) => {
      d.electricity.pricePerKwh = '0.31';
      d.title = 'Test room, mine';
    });
    const merge = threeWayMerge(base, mine, theirs);
    expect(merge.clashes.map(({ where, base: b, mine: m, theirs: t }) => ({ where, b, m, t }))).toEqual([
      { where: 'electricity.pricePerKwh', b: '0.2', m: '0.31', t: '0.25' },
    ]);
    const takeTheirs = mergedScenario(merge, { 'electricity.pricePerKwh': 'theirs' });
    const keepMine = mergedScenario(merge, { 'electricity.pricePerKwh': 'mine' });
    expect(takeTheirs.ok && [takeTheirs.value.electricity.pricePerKwh, takeTheirs.value.title]).toEqual(['0.25', 'Test room, mine']);
    expect(keepMine.ok && keepMine.value.electricity.pricePerKwh).toBe('0.31');
  });

  it('keeps an option I added and a field they changed on another option, matched by id not position', () => {
    const theirs = edit(base, (d) => (d.options[1]!.wallWatts = 620));
    const mine = edit(base, (d) => d.options.splice(0, 0, added));
    const merge = threeWayMerge(base, mine, theirs);
    expect(merge.clashes).toEqual([]);
    const checked = mergedScenario(merge, {});
    expect(checked.ok && checked.value.options.map((o) => [o.id, o.wallWatts])).toEqual([['panel', 400], ['sodium', 640], ['bar', 620]]);
  });

  it('compares an option both added under one id field by field', () => {
    const mine = edit(base, (d) => d.options.push(added));
    const theirs = edit(base, (d) => d.options.push({ ...added, wallWatts: 420 }));
    const merge = threeWayMerge(base, mine, theirs);
    expect(merge.clashes.map((c) => [c.where, c.mine, c.theirs])).toEqual([['options[panel].wallWatts', 400, 420]]);
    const checked = mergedScenario(merge, { 'options[panel].wallWatts': 'theirs' });
    expect(checked.ok && checked.value.options.map((o) => [o.id, o.wallWatts])).toEqual([['sodium', 640], ['bar', 600], ['panel', 420]]);
  });

  it('removes an option one side removed when the other left it alone', () => {
    const theirs = edit(base, (d) => (d.title = 'Renamed'));
    const mine = edit(base, (d) => d.options.splice(1, 1));
    const checked = mergedScenario(threeWayMerge(base, mine, theirs), {});
    expect(checked.ok && checked.value.options.map((o) => o.id)).toEqual(['sodium']);
    expect(checked.ok && checked.value.title).toBe('Renamed');
  });

  it('makes an option removed by me and edited by them a clash on the whole option', () => {
    const theirs = edit(base, (d) => (d.options[1]!.fixturePrice = '1100'));
    const mine = edit(base, (d) => d.options.splice(1, 1));
    const merge = threeWayMerge(base, mine, theirs);
    expect(merge.clashes.map((c) => [c.where, c.mine === undefined])).toEqual([['options[bar]', true]]);
    const removed = mergedScenario(merge, { 'options[bar]': 'mine' });
    const kept = mergedScenario(merge, { 'options[bar]': 'theirs' });
    expect(removed.ok && removed.value.options.map((o) => o.id)).toEqual(['sodium']);
    expect(kept.ok && kept.value.options.map((o) => [o.id, o.fixturePrice])).toEqual([['sodium', undefined], ['bar', '1100']]);
  });

  it('merges growth phases by position, and treats a phase added against a phase changed as one clash', () => {
    const longer = edit(base, (d) => (d.schedule[0]!.daysPerYear = 320));
    const renamed = edit(base, (d) => (d.schedule[0]!.label = 'bloom'));
    const both = mergedScenario(threeWayMerge(base, renamed, longer), {});
    expect(both.ok && both.value.schedule).toEqual([{ label: 'bloom', hoursPerDay: 12, daysPerYear: 320 }]);

    const grown = edit(base, (d) => d.schedule.unshift({ label: 'veg', hoursPerDay: 18, daysPerYear: 40 }));
    expect(threeWayMerge(base, grown, longer).clashes.map((c) => c.where)).toEqual(['schedule']);
  });

  it('reports the schema problems of a merge whose two valid halves break a rule together, instead of a document', () => {
    const theirs = edit(base, (d) => (d.schedule[0]!.daysPerYear = 360));
    const mine = edit(base, (d) => (d.target = { dli: 30 }));
    const twoPhases = edit(theirs, (d) => d.schedule.push({ label: 'veg', hoursPerDay: 18, daysPerYear: 6 }));
    const checked = mergedScenario(threeWayMerge(base, mine, twoPhases), {});
    expect(checked.ok).toBe(false);
    expect(!checked.ok && checked.problems.map((p) => p.path)).toEqual(['target.dli']);
  });

  it('lists what each side changed, options by id', () => {
    const theirs = edit(base, (d) => (d.electricity.demandChargePerKwMonth = '2.5'));
    const mine = edit(base, (d) => {
      d.options.push(added);
      d.options[0]!.label = 'Sodium, ours';
    });
    expect(sideChanges(base, theirs)).toEqual([{ where: 'electricity.demandChargePerKwMonth', before: '0', after: '2.5' }]);
    expect(sideChanges(base, mine).map((c) => c.where)).toEqual(['options[sodium].label', 'options[panel]']);
  });
});

// No hyphen in generated ids, so the `m-` and `t-` ids the properties add never repeat one of the base's.
const ids = fc.uniqueArray(fc.stringMatching(/^[a-z][a-z0-9]{0,6}$/), { minLength: 1, maxLength: 6 });
const item = (id: string) => fc.record({ id: fc.constant(id), watts: fc.integer({ min: 1, max: 2000 }), label: fc.string({ maxLength: 6 }) });
const doc = ids.chain((list) =>
  fc.record({
    title: fc.string({ maxLength: 8 }),
    price: fc.integer({ min: 0, max: 100 }),
    nested: fc.record({ a: fc.integer(), b: fc.boolean() }),
    options: fc.tuple(...list.map(item)),
  }),
);
const fields = ['title', 'price'] as const;

describe('threeWayMerge properties', () => {
  it('gives my version when theirs is the base, and theirs when mine is', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.jsonValue(), (b, m) => {
        const noChangeThere = threeWayMerge(b, m, b);
        const noChangeHere = threeWayMerge(b, b, m);
        expect(noChangeThere.clashes).toEqual([]);
        expect(noChangeHere.clashes).toEqual([]);
        expect(settle(noChangeThere, {})).toStrictEqual(m);
        expect(settle(noChangeHere, {})).toStrictEqual(m);
      }),
    );
  });

  it('finds no clash and keeps every change when the two sides change different fields', () => {
    const who = fc.constantFrom('none', 'mine', 'theirs');
    fc.assert(
      fc.property(doc, fc.array(who, { minLength: 3, maxLength: 3 }), fc.array(who, { minLength: 6, maxLength: 6 }), (b, top, per) => {
        const [mine, theirs, expected] = [structuredClone(b), structuredClone(b), structuredClone(b)];
        top.forEach((side, i) => {
          if (side === 'none') return;
          const target = side === 'mine' ? mine : theirs;
          if (i < 2) {
            const f = fields[i]!;
            if (f === 'title') target.title = expected.title = `${b.title}!`;
            else target.price = expected.price = b.price + 1;
          } else target.nested.b = expected.nested.b = !b.nested.b;
        });
        b.options.forEach((o, i) => {
          const side = per[i] ?? 'none';
          if (side === 'none') return;
          const target = side === 'mine' ? mine : theirs;
          target.options[i]!.watts = expected.options[i]!.watts = o.watts + 1;
        });
        const merge = threeWayMerge(b, mine, theirs);
        expect(merge.clashes).toEqual([]);
        expect(settle(merge, {})).toStrictEqual(expected);
      }),
    );
  });

  it('keeps options added on both sides, and every option neither side removed', () => {
    fc.assert(
      fc.property(doc, ids, ids, (b, forMe, forThem) => {
        const fresh = (list: string[], mark: string) => list.map((id) => `${mark}${id}`);
        const mine = { ...b, options: [...b.options, ...fresh(forMe, 'm-').map((id) => ({ id, watts: 1, label: 'mine' }))] };
        const theirs = { ...b, options: [...fresh(forThem, 't-').map((id) => ({ id, watts: 2, label: 'theirs' })), ...b.options] };
        const merge = threeWayMerge(b, mine, theirs);
        expect(merge.clashes).toEqual([]);
        const merged = settle(merge, {}) as typeof b;
        const got = merged.options.map((o) => o.id).sort();
        expect(got).toEqual([...b.options.map((o) => o.id), ...fresh(forMe, 'm-'), ...fresh(forThem, 't-')].sort());
      }),
    );
  });

  it('reports a clash exactly where both sides set one field to different values', () => {
    fc.assert(
      fc.property(doc, fc.integer({ min: 1, max: 50 }), (b, bump) => {
        const mine = { ...b, price: b.price + bump };
        const theirs = { ...b, price: b.price + bump + 1 };
        const merge = threeWayMerge(b, mine, theirs);
        expect(merge.clashes.map((c) => c.where)).toEqual(['price']);
        expect((settle(merge, { price: 'theirs' }) as typeof b).price).toBe(theirs.price);
        expect((settle(merge, { price: 'mine' }) as typeof b).price).toBe(mine.price);
      }),
    );
  });
});
