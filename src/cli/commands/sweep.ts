import type { Problem } from '../../contracts/problems';
import { check } from '../../contracts/problems';
import type { Scenario } from '../../contracts/scenario';
import { efficacyAxisSchema, sweepSettingsSchema } from '../../contracts/sensitivity';
import { checkSweepSettings, runSweep } from '../../engine';
import type { SweepResult } from '../../engine';
import { InputError } from '../errors';
import { printJson, table } from '../io';
import { loadScenarioFile } from '../load-scenario';
import type { CliCommand } from './types';

const USAGE = 'sweep FILE --vary ID --tariff LO:HI:N --efficacy LO:HI:N [--json]';
const PART = { lo: 'LO', hi: 'HI', n: 'N' } as const;

/** "0.1:0.4:31" → { lo, hi, n }; anything else is kept as text so the schema reports it. */
function rangeFlag(raw: string | boolean | undefined): unknown {
  if (typeof raw !== 'string') return undefined;
  const parts = raw.split(':');
  if (parts.length !== 3 || parts.some((p) => p.trim() === '' || !Number.isFinite(Number(p)))) return raw;
  const [lo, hi, n] = parts.map(Number);
  return { lo, hi, n };
}

/** `tariff.hi` → `--tariff HI`, so each problem names the flag and the part of it. */
function flagLine(p: Problem): string {
  const [flag, part] = p.path.split('.');
  if (p.message === 'must be a group of fields ({ … })') return `--${flag}: must be LO:HI:N, three numbers such as 0.10:0.40:31`;
  const label = part ? ` ${PART[part as keyof typeof PART] ?? part}` : '';
  return `--${flag}${label}: ${p.message}`;
}

function loadOrCollect(file: string | undefined, lines: string[]): Scenario | undefined {
  try {
    return loadScenarioFile(file);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    lines.push(...error.lines);
    return undefined;
  }
}

function printTable(s: Scenario, r: SweepResult): void {
  const key = new Map(Object.keys(r.presentValue).map((id, i) => [id, String(i + 1)]));
  const header = ['price \\ factor', ...r.efficacyFactors.map((f) => f.toPrecision(3))];
  const rows = r.tariffs.map((t, i) => [t.toFixed(4), ...(r.winner[i] ?? []).map((id) => key.get(id) ?? '?')]);
  process.stdout.write(`${s.title}\nlowest present value by electricity price (rows, per kWh) and efficacy multiplier on "${r.vary}" (columns)\n\n`);
  process.stdout.write(`${table(header, rows)}\n\n`);
  const ranges = Object.entries(r.presentValue).map(([id, grid]) => {
    const all = grid.flat();
    const wins = r.winner.flat().filter((w) => w === id).length;
    return [`${key.get(id)} = ${id}`, `${((100 * wins) / Math.max(1, all.length)).toFixed(1)} %`, Math.min(...all).toFixed(0), Math.max(...all).toFixed(0)];
  });
  process.stdout.write(`${table(['option', 'cells won', `lowest PV (${s.currency})`, `highest PV (${s.currency})`], ranges)}\n`);
}

/** `sweep FILE --vary ID --tariff LO:HI:N --efficacy LO:HI:N [--json]` → photon-parity/sweep@1, or a table. */
export const sweep: CliCommand = {
  usage: USAGE,
  summary: 'present values over electricity price × efficacy of one option',
  options: { vary: { type: 'string' }, tariff: { type: 'string' }, efficacy: { type: 'string' }, json: { type: 'boolean' } },
  run({ positionals, values }) {
    const lines: string[] = [];
    if (positionals.length !== 1) lines.push(`expected one FILE, got ${positionals.length}; usage: ${USAGE}`);
    const efficacy = rangeFlag(values.efficacy);
    const settings = check(sweepSettingsSchema, { vary: values.vary, tariff: rangeFlag(values.tariff), efficacy });
    if (!settings.ok) lines.push(...settings.problems.map(flagLine));
    const scenario = positionals.length === 1 ? loadOrCollect(positionals[0], lines) : undefined;
    if (scenario) {
      const axis = efficacyAxisSchema.safeParse(efficacy);
      const vary = typeof values.vary === 'string' ? values.vary : undefined;
      lines.push(...checkSweepSettings(scenario, { vary, efficacy: axis.success ? axis.data : undefined }).map(flagLine));
    }
    if (lines.length > 0 || !scenario || !settings.ok) throw new InputError(lines);
    const result = runSweep(scenario, settings.value);
    if (values.json) printJson(result);
    else printTable(scenario, result);
    return 0;
  },
};
