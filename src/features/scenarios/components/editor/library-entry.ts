import { optionSchema } from '../../../../contracts/scenario';
import type { OptionInput } from '../../../../contracts/scenario';

/** A fixture-library entry as the editor sees it: the option it stands for and where its figures come from. */
export interface LibraryEntry {
  key: string;
  label: string;
  dataSource: 'datasheet' | 'measured' | 'estimate';
  /** The measurement its figures came from, while that measurement is kept. */
  measurementId?: string | null;
  option: OptionInput;
}

const COMPARED: Array<[string, (o: OptionInput) => unknown]> = [
  ['label', (o) => o.label],
  ['technology', (o) => o.technology],
  ['wall power', (o) => o.wallWatts],
  ['efficacy', (o) => o.photonEfficacy],
  ['PPF', (o) => o.ppf],
  ['owned', (o) => Boolean(o.owned)],
  ['fixture price', (o) => money(o.fixturePrice)],
  ['installation', (o) => money(o.installPrice ?? '0')],
  ['rebate', (o) => money(o.rebate ?? '0')],
  ['lamp', (o) => (o.lamp ? `${money(o.lamp.price)}|${o.lamp.replaceEveryHours}|${o.lamp.outputAtReplacementPct}` : undefined)],
  ['output at horizon', (o) => o.outputAtHorizonPct ?? 100],
];

function money(v: unknown): string | undefined {
  if (v === undefined || v === null || v === '') return undefined;
  const n = Number(v);
  return Number.isFinite(n) ? String(n) : String(v);
}

/** The names of the figures a scenario's option overrides relative to its library entry. */
export function overriddenFields(option: OptionInput, entry: OptionInput): string[] {
  return COMPARED.filter(([, read]) => read(option) !== read(entry)).map(([name]) => name);
}

/** An option id not yet used in the scenario, based on the wanted one. */
export function freeId(wanted: string, used: ReadonlySet<string>): string {
  if (!used.has(wanted)) return wanted;
  for (let i = 2; ; i++) {
    const candidate = `${wanted.slice(0, 36)}-${i}`;
    if (!used.has(candidate)) return candidate;
  }
}

/** Only the fields a scenario option has: a library entry may carry more (notes, links to measurements). */
export function optionFields(entry: OptionInput): OptionInput {
  const source = entry as unknown as Record<string, unknown>;
  const out: Record<string, unknown> = {};
  for (const k of Object.keys(optionSchema.shape)) if (source[k] !== undefined && source[k] !== null) out[k] = structuredClone(source[k]);
  return out as unknown as OptionInput;
}
