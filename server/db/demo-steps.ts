import type { Config } from '../config';
import type { Example } from '../examples';
import type { DemoStep } from './demo';

/** What the demo steps may use. */
export interface DemoContext {
  config: Config;
  examples: Example[];
}

/** The steps that put the invented demo into a fresh database, in order. */
export function demoSteps(_ctx: DemoContext): DemoStep[] {
  return [];
}
