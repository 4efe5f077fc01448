import type { ScenarioResult } from '../../../src/engine';

const LIMIT = 500;

/**
 * Results of stored scenarios by id and revision. A revision's document never changes (revisions
 * are append-only), so its result cannot go stale; the engine version is in the key for the day a
 * server process is upgraded in place. Oldest entries leave first.
 */
export class ResultCache {
  private readonly entries = new Map<string, ScenarioResult>();

  constructor(private readonly limit = LIMIT) {}

  get(key: string): ScenarioResult | undefined {
    const hit = this.entries.get(key);
    if (hit) {
      this.entries.delete(key);
      this.entries.set(key, hit);
    }
    return hit;
  }

  set(key: string, result: ScenarioResult): void {
    this.entries.delete(key);
    this.entries.set(key, result);
    if (this.entries.size > this.limit) this.entries.delete(this.entries.keys().next().value as string);
  }
}
