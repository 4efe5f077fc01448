import { check } from '../../contracts/problems';
import { breakevenPriceSettingsSchema } from '../../contracts/sensitivity';
import { breakevenDocument, breakevenEfficacy, breakevenPrice, checkOptionId } from '../../engine';
import type { PriceBreakeven } from '../../engine';
import type { Scenario } from '../../contracts/scenario';
import { InputError } from '../errors';
import { printJson } from '../io';
import { loadScenarioFile } from '../load-scenario';
import type { CliCommand } from './types';

const USAGE = 'breakeven FILE A B [--json]';

const REASON = {
  'equal-at-every-price': 'the two options cost the same at every price',
  'never-equal': 'the two options use the same energy, so the price never closes the gap',
  'outside-range': 'they would be equal only outside 0 to 100 per kWh',
} as const;

function describe(s: Scenario, r: PriceBreakeven): string {
  const lines = [`${s.title}`, ''];
  if (r.pricePerKwh === null) lines.push(`no break-even electricity price between "${r.a}" and "${r.b}": ${REASON[r.reason ?? 'outside-range']}`);
  else lines.push(`"${r.a}" and "${r.b}" have the same present value at ${r.pricePerKwh.toFixed(6)} ${s.currency} per kWh (year-1 price; entered ${s.electricity.pricePerKwh})`);
  for (const [vary, against] of [[r.a, r.b], [r.b, r.a]] as const) {
    const e = breakevenEfficacy(s, { vary, against, lo: 0.1, hi: 10 });
    if (e.factor === null) continue;
    const how = e.kind === 'step' ? ' (whole fixtures: the count drops by one there)' : '';
    lines.push(`at the entered price, "${vary}" matches "${against}" once its photon efficacy is ×${e.factor.toFixed(6)}${how}`);
  }
  if (!r.verified) lines.push('note: bisection on the fast path did not confirm the closed form to 1e-9 per kWh');
  return `${lines.join('\n')}\n`;
}

/** `breakeven FILE A B [--json]`: the electricity price at which A and B cost the same → photon-parity/breakeven@1. */
export const breakeven: CliCommand = {
  usage: USAGE,
  summary: 'electricity price at which two options have equal present value',
  options: { json: { type: 'boolean' } },
  run({ positionals, values }) {
    const [file, a, b, ...extra] = positionals;
    const lines: string[] = [];
    if (extra.length > 0 || positionals.length < 3) lines.push(`expected FILE A B, got ${positionals.length} arguments; usage: ${USAGE}`);
    const settings = check(breakevenPriceSettingsSchema, { a, b });
    if (!settings.ok) lines.push(...settings.problems.map((p) => `${p.path.toUpperCase()}: ${p.message.replace(/ a$/, ' A')}`));
    let scenario: Scenario | undefined;
    try {
      scenario = loadScenarioFile(file);
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      lines.push(...error.lines);
    }
    if (scenario) {
      const ids = [a === undefined ? [] : checkOptionId(scenario, a, 'A'), b === undefined || b === a ? [] : checkOptionId(scenario, b, 'B')].flat();
      lines.push(...ids.map((p) => `${p.path}: ${p.message}`));
    }
    if (lines.length > 0 || !scenario || !settings.ok) throw new InputError(lines);
    const result = breakevenPrice(scenario, settings.value);
    if (values.json) printJson(breakevenDocument(result));
    else process.stdout.write(describe(scenario, result));
    return 0;
  },
};
