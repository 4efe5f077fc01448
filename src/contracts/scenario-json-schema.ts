import { z } from './zod-messages';
import { SCENARIO_FORMAT, scenarioSchema } from './scenario';

/**
 * The JSON Schema (draft 2020-12) of a scenario file, generated from the zod schema so the two
 * cannot drift; checked in as scenarios/scenario.schema.json. Cross-field rules (exactly one of
 * photonEfficacy and ppf, unique ids, the baseline naming an option) live only in the zod schema
 * and are listed in the description.
 */
export function scenarioJsonSchema(): Record<string, unknown> {
  const generated = z.toJSONSchema(scenarioSchema, { io: 'input', target: 'draft-2020-12' }) as Record<string, unknown>;
  return {
    $id: 'https://photon-parity.invalid/schemas/scenario@1.json',
    title: 'Photon Parity scenario file',
    description:
      `Format ${SCENARIO_FORMAT}. Also checked by the application: each option gives exactly one of photonEfficacy and ppf; ` +
      'option ids are unique; baseline names an option; a DLI target needs exactly one schedule row; the schedule has at most 366 days; ' +
      'fixturePrice is required unless the option is owned; ppf / wallWatts is at most 5.85 µmol/J.',
    ...generated,
  };
}

/** The schema as the checked-in file's text (2-space JSON with a final newline). */
export function scenarioJsonSchemaText(): string {
  return `${JSON.stringify(scenarioJsonSchema(), null, 2)}\n`;
}
