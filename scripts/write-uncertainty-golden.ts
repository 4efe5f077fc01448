import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { uncertaintySettingsSchema } from '../src/contracts/sensitivity';
import { checkUncertaintySettings, ENGINE_VERSION, parseScenario, runUncertainty } from '../src/engine';

// Recomputes the `summary` of every scenarios/golden/*.uncertainty.json from its own `scenario` and
// `settings`. Run only after a deliberate change to the engine's rules or to the generator, together
// with an ENGINE_VERSION bump, and review the diff: these numbers pin the seeded runs.
for (const file of readdirSync('scenarios/golden').filter((f) => f.endsWith('.uncertainty.json'))) {
  const path = `scenarios/golden/${file}`;
  const golden = JSON.parse(readFileSync(path, 'utf8')) as { scenario: string; settings: unknown };
  const checked = parseScenario(JSON.parse(readFileSync(`scenarios/${golden.scenario}`, 'utf8')));
  if (!checked.ok) throw new Error(`${golden.scenario} is invalid`);
  const settings = uncertaintySettingsSchema.parse(golden.settings);
  const problems = checkUncertaintySettings(checked.value, settings);
  if (problems.length) throw new Error(`${file}: ${problems.map((p) => `${p.path}: ${p.message}`).join('; ')}`);
  const summary = runUncertainty(checked.value, settings);
  writeFileSync(path, `${JSON.stringify({ scenario: golden.scenario, engineVersion: ENGINE_VERSION, settings, summary }, null, 2)}\n`);
  process.stdout.write(`wrote ${path}\n`);
}
