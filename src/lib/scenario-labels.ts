import type { Scenario } from '../contracts/scenario';

const FIELD_WORDS: Record<string, string> = {
  wallWatts: 'wall watts',
  photonEfficacy: 'photon efficacy',
  ppf: 'PPF',
  fixturePrice: 'fixture price',
  installPrice: 'installation per fixture',
  rebate: 'rebate per fixture',
  'lamp.price': 'lamp price',
  'lamp.replaceEveryHours': 'hours between relamping',
  'lamp.outputAtReplacementPct': 'light output when relamped',
  outputAtHorizonPct: 'light output at the last year',
};

const SCENARIO_WORDS: Record<string, string> = {
  'electricity.pricePerKwh': 'Electricity price, year 1',
  'electricity.escalationPctPerYear': 'Electricity price rise per year',
  'electricity.demandChargePerKwMonth': 'Demand charge',
  discountRatePct: 'Discount rate',
  utilization: 'Share of photons reaching the canopy',
  'canopy.lengthM': 'Canopy length',
  'canopy.widthM': 'Canopy width',
  'target.ppfd': 'Target PPFD',
  'target.dli': 'Target DLI',
  horizonYears: 'Years compared',
  'cooling.cop': 'Cooling COP',
  'cooling.share': 'Share of lamp heat the cooling removes',
};

/** A short name for an option in charts and dense tables: its label, cut at a comma or at 34 characters. */
export function shortName(s: Scenario, id: string): string {
  const label = s.options.find((o) => o.id === id)?.label ?? id;
  const head = label.split(',')[0]!.trim();
  return head.length > 34 ? `${head.slice(0, 33)}…` : head;
}

/** The full label of an option. */
export function optionLabel(s: Scenario, id: string): string {
  return s.options.find((o) => o.id === id)?.label ?? id;
}

/** A field path of the scenario in plain words, e.g. `options[2].lamp.price` → "LED bar fixture: lamp price". */
export function inputLabel(s: Scenario, path: string): string {
  const known = SCENARIO_WORDS[path];
  if (known) return known;
  const option = /^options\[(\d+)\]\.(.+)$/.exec(path);
  if (option) {
    const o = s.options[Number(option[1])];
    return `${o ? shortName(s, o.id) : `Option ${option[1]}`}: ${FIELD_WORDS[option[2]!] ?? option[2]}`;
  }
  const phase = /^schedule\[(\d+)\]\.(hoursPerDay|daysPerYear)$/.exec(path);
  if (phase) {
    const row = s.schedule[Number(phase[1])];
    return `${phase[2] === 'hoursPerDay' ? 'Hours per day' : 'Days per year'}, ${row?.label ?? `phase ${Number(phase[1]) + 1}`}`;
  }
  return path;
}

/**
 * A changed field in plain words, for paths that name options by id (`options[led-720].wallWatts`
 * → "LED bar: wall watts") as well as scenario fields; unknown paths come back as they are.
 */
export function changedFieldLabel(doc: { options?: ReadonlyArray<{ id?: string; label?: string } | undefined> } | undefined, where: string): string {
  const known = SCENARIO_WORDS[where];
  if (known) return known;
  const option = /^options\[([^\]]+)\]\.(.+)$/.exec(where);
  if (!option) return where;
  const id = option[1]!;
  const label = doc?.options?.find((o) => o?.id === id)?.label?.split(',')[0]?.trim();
  return `${label || id}: ${FIELD_WORDS[option[2]!] ?? option[2]}`;
}
