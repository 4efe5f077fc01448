import { writeFileSync } from 'node:fs';
import { scenarioJsonSchemaText } from '../src/contracts/scenario-json-schema';

writeFileSync('scenarios/scenario.schema.json', scenarioJsonSchemaText());
process.stdout.write('wrote scenarios/scenario.schema.json\n');
