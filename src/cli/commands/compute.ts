import { computeScenario, minorUnitDigits, roundForDisplay } from '../../engine';
import { loadScenarioFile } from '../load-scenario';
import { printJson, table } from '../io';
import type { CliCommand } from './types';

/** `compute FILE [--json]`: a scenario → photon-parity/result@1, or a readable summary table. */
export const compute: CliCommand = {
  usage: 'compute FILE [--json]',
  summary: 'level every option and price it over the horizon',
  options: { json: { type: 'boolean' } },
  run({ positionals, values }) {
    const scenario = loadScenarioFile(positionals[0]);
    const result = computeScenario(scenario);
    if (values.json) {
      printJson(result);
      return 0;
    }
    const money = (v: string) => roundForDisplay(v, scenario.currency).toFixed(minorUnitDigits(scenario.currency));
    const rows = result.options.map((o) => [
      o.id + (o.id === result.cheapest ? ' *' : '') + (o.id === scenario.baseline ? ' (baseline)' : ''),
      o.fixturesExact.toFixed(2),
      o.fixturesWhole,
      o.achievedPpfd.toFixed(0),
      money(o.capex),
      money(o.totalNominal),
      money(o.totalPresentValue),
      new Intl.NumberFormat('en', { maximumSignificantDigits: 4 }).format(Number(o.costPerMol)),
      o.paybackYears === null ? '-' : o.paybackYears.toFixed(2),
    ]);
    process.stdout.write(`${scenario.title}\n`);
    process.stdout.write(
      `canopy ${result.canopyAreaM2} m², target ${result.targetPpfd.toFixed(0)} µmol m⁻² s⁻¹, ${result.litHoursPerYear} lit h/year, ` +
        `${scenario.horizonYears} years, money in ${scenario.currency}\n\n`,
    );
    process.stdout.write(
      `${table(['option', 'fixtures', 'whole', 'PPFD', 'capital', 'total', 'present value', 'per mol', 'payback y'], rows)}\n\n`,
    );
    process.stdout.write(`* lowest present value: ${result.cheapest}\ninput hash ${result.inputHash}, engine ${result.engineVersion}\n`);
    return 0;
  },
};
