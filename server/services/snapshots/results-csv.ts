import type { Scenario } from '../../../src/contracts/scenario';
import type { ScenarioResult } from '../../../src/engine';

/**
 * One CSV cell (RFC 4180: quoted when it holds a comma, quote or line break). Text that a
 * spreadsheet would run as a formula (starting with = + - @, tab or carriage return) gets a
 * leading apostrophe, as the OWASP "CSV Injection" page advises; numbers are written as they are.
 */
function cell(value: string | number | boolean | null): string {
  if (value === null) return '';
  if (typeof value !== 'string') return String(value);
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

function csv(header: string[], rows: Array<Array<string | number | boolean | null>>): string {
  return [header.join(','), ...rows.map((r) => r.map(cell).join(','))].join('\r\n') + '\r\n';
}

/** Money cells stay full-precision decimal text, as the engine gives them, so totals can be checked digit for digit. */
const money = (v: string) => Number.isFinite(Number(v)) ? v : '';

/** One line per option: leveled counts, energy, each cost part, totals, cost per mol and payback. */
export function totalsCsv(scenario: Scenario, result: ScenarioResult): string {
  const byId = new Map(scenario.options.map((o) => [o.id, o]));
  return csv(
    ['option_id', 'label', 'technology', 'fixtures_exact', 'fixtures_whole', 'fixtures_used', 'achieved_ppfd', 'energy_kwh_per_year', 'cooling_kwh_per_year',
      'capex', 'energy_cost', 'cooling_cost', 'demand_cost', 'lamp_cost', 'total_nominal', 'total_present_value', 'cost_per_mol', 'payback_years', 'lowest_present_value', 'currency'],
    result.options.map((o) => [
      o.id, byId.get(o.id)?.label ?? o.id, byId.get(o.id)?.technology ?? '', o.fixturesExact, o.fixturesWhole, o.fixturesUsed, o.achievedPpfd,
      o.energyKwhPerYear, o.coolingKwhPerYear, money(o.capex), money(o.energyCost), money(o.coolingCost), money(o.demandCost), money(o.lampCost),
      money(o.totalNominal), money(o.totalPresentValue), money(o.costPerMol), o.paybackYears, o.id === result.cheapest, scenario.currency,
    ]),
  );
}

/** The yearly ledger of every option, one line per option and year (year 0 holds the capital outlay). */
export function ledgerCsv(scenario: Scenario, result: ScenarioResult): string {
  const label = (id: string) => scenario.options.find((o) => o.id === id)?.label ?? id;
  return csv(
    ['option_id', 'label', 'year', 'capex', 'energy', 'cooling', 'demand', 'lamps', 'total', 'cumulative', 'currency'],
    result.options.flatMap((o) =>
      o.years.map((y) => [o.id, label(o.id), y.year, money(y.capex), money(y.energy), money(y.cooling), money(y.demand), money(y.lamps), money(y.total), money(y.cumulative), scenario.currency]),
    ),
  );
}
