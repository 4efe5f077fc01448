import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { scenarioJsonSchemaText } from '../../src/contracts/scenario-json-schema';

describe('scenarios/scenario.schema.json', () => {
  it('is exactly what the zod schema generates (run `npm run schema:write` after changing the schema)', () => {
    const onDisk = readFileSync(new URL('../../scenarios/scenario.schema.json', import.meta.url), 'utf8');
    expect(onDisk).toBe(scenarioJsonSchemaText());
  });

  it('describes the fields of the format, with unknown fields refused', () => {
    const schema = JSON.parse(scenarioJsonSchemaText());
    expect(schema.required).toEqual(expect.arrayContaining(['format', 'title', 'currency', 'canopy', 'target', 'schedule', 'horizonYears', 'electricity', 'baseline', 'options']));
    expect(schema.additionalProperties).toBe(false);
    expect(schema.properties.options.items.properties.technology.enum).toEqual(['hps', 'mh', 'cmh', 'led', 'fluorescent', 'other']);
  });
});
