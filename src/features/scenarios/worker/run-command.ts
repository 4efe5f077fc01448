import { computeScenario } from '../../../engine/compute';
import { parseScenario } from '../../../engine/parse';
import type { ComputeCommand, ComputeReply } from './protocol';

/** Validates and computes a document; the same function runs in the worker and, as a fallback, on the page. */
export function runCommand(cmd: ComputeCommand, now: () => number): ComputeReply {
  switch (cmd.type) {
    case 'compute': {
      const started = now();
      const checked = parseScenario(cmd.document);
      if (!checked.ok) return { type: 'invalid', id: cmd.id, problems: checked.problems };
      try {
        const result = computeScenario(checked.value);
        return { type: 'computed', id: cmd.id, scenario: checked.value, result, ms: now() - started };
      } catch (error) {
        return { type: 'failed', id: cmd.id, message: error instanceof Error ? error.message : String(error) };
      }
    }
  }
}
