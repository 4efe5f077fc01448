import { gridDocument, readPpfdGrid } from '../../engine';
import type { FileProblem } from '../../engine';
import { as } from '../../engine/units';
import type { SquareMetres, Watts } from '../../engine/units';
import { InputError } from '../errors';
import { printJson, readInputFile, table } from '../io';
import type { CliCommand } from './types';

/** A positive number from a flag, or undefined when the flag is absent. */
function positiveFlag(values: Record<string, string | boolean | undefined>, name: string, problems: string[]): number | undefined {
  const raw = values[name];
  if (raw === undefined) return undefined;
  const value = Number(raw);
  if (typeof raw !== 'string' || raw.trim() === '' || !Number.isFinite(value) || value <= 0) problems.push(`--${name}: must be a number greater than 0`);
  return value;
}

/** `file, line 4: column 2: "abc" is not a number` */
export function fileProblemLines(file: string, problems: FileProblem[]): string[] {
  return problems.map((p) => (p.line === null ? `${file}: ${p.message}` : `${file}, ${p.path}: ${p.message}`));
}

const fmt = (v: number, digits: number) => v.toFixed(digits);
const USAGE = 'grid FILE [--wall-watts W --area-m2 A] [--json]';

/** `grid FILE [--wall-watts W --area-m2 A] [--json]`: a PPFD grid CSV → photon-parity/grid@1 or a table. */
export const grid: CliCommand = {
  usage: USAGE,
  summary: 'summarise a grid of PPFD readings over the canopy',
  options: { 'wall-watts': { type: 'string' }, 'area-m2': { type: 'string' }, json: { type: 'boolean' } },
  run({ positionals, values }) {
    const file = positionals[0];
    const flagProblems: string[] = [];
    const wallWatts = positiveFlag(values, 'wall-watts', flagProblems);
    const areaM2 = positiveFlag(values, 'area-m2', flagProblems);
    if (wallWatts !== undefined && areaM2 === undefined) flagProblems.push('--wall-watts: needs --area-m2 as well (efficacy at the canopy is mean PPFD × area / wall watts)');
    if (positionals.length > 1) flagProblems.push(`expected one FILE, got ${positionals.length}; usage: ${USAGE}`);
    if (flagProblems.length > 0) throw new InputError(flagProblems);
    const text = readInputFile(file);
    const context = { ...(areaM2 === undefined ? {} : { areaM2: as<SquareMetres>(areaM2) }), ...(wallWatts === undefined ? {} : { wallWatts: as<Watts>(wallWatts) }) };
    const read = readPpfdGrid(text, context);
    if (!read.ok) throw new InputError(fileProblemLines(file ?? '', read.problems));
    const s = read.value;
    if (values.json) {
      printJson(gridDocument(s));
      return 0;
    }
    const rows: (string | number)[][] = [
      ['readings', `${s.rows} rows × ${s.cols} columns = ${s.count}`, ''],
      ['mean PPFD', fmt(s.mean, 1), 'µmol m⁻² s⁻¹'],
      ['min PPFD', fmt(s.min, 1), 'µmol m⁻² s⁻¹'],
      ['max PPFD', fmt(s.max, 1), 'µmol m⁻² s⁻¹'],
      ['uniformity min/mean', fmt(s.minOverMean, 3), ''],
      ['uniformity min/max', fmt(s.minOverMax, 3), ''],
      ['coefficient of variation', `${fmt(s.cv * 100, 1)} %`, 'population standard deviation / mean'],
    ];
    if (s.canopyFlux !== null) rows.push(['photon flux on the canopy', fmt(s.canopyFlux, 0), `µmol/s over ${areaM2} m²`]);
    if (s.efficacyAtCanopy !== null) rows.push(['efficacy at the canopy', fmt(s.efficacyAtCanopy, 2), `µmol/J at ${wallWatts} W from the wall`]);
    process.stdout.write(`${file}\n\n${table(['figure', 'value', 'unit'], rows)}\n`);
    if (s.cols <= 16) {
      process.stdout.write(`\nreadings, µmol m⁻² s⁻¹ (one canopy row per line${s.yM ? ', ascending y' : ''}):\n`);
      for (const r of s.cells) process.stdout.write(`  ${r.map((v) => fmt(v, 0).padStart(6)).join(' ')}\n`);
    }
    return 0;
  },
};
