import { readdirSync, readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import { computeScenario, parseScenario } from '../src/engine';

// Regenerates scenarios/golden/*.result.json. Run only after a deliberate change to the engine rules,
// together with an ENGINE_VERSION bump, and review the diff.
mkdirSync('scenarios/golden', { recursive: true });
for (const file of readdirSync('scenarios').filter((f) => f.endsWith('.scenario.json'))) {
  const checked = parseScenario(JSON.parse(readFileSync(`scenarios/${file}`, 'utf8')));
  if (!checked.ok) throw new Error(`${file} is invalid`);
  const out = `scenarios/golden/${file.replace('.scenario.json', '.result.json')}`;
  writeFileSync(out, `${JSON.stringify(computeScenario(checked.value), null, 2)}\n`);
  process.stdout.write(`wrote ${out}\n`);
}
