import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Scenario } from '../src/contracts/scenario';
import { parseScenario } from '../src/engine';

/** A scenario file shipped in scenarios/: the invented demo and worked examples. */
export interface Example {
  id: string;
  title: string;
  scenario: Scenario;
}

/**
 * Reads and validates every `*.scenario.json` in the folder once. A shipped file that fails
 * validation is a build defect, so it throws rather than being skipped.
 */
export function loadExamples(folder: string): Example[] {
  return readdirSync(folder)
    .filter((f) => f.endsWith('.scenario.json'))
    .sort()
    .map((file) => {
      const checked = parseScenario(JSON.parse(readFileSync(join(folder, file), 'utf8')));
      if (!checked.ok) throw new Error(`${file}: ${checked.problems.map((p) => `${p.path}: ${p.message}`).join('; ')}`);
      return { id: file.replace(/\.scenario\.json$/, ''), title: checked.value.title, scenario: checked.value };
    });
}
