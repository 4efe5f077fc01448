/** One measured figure of the benchmark report. */
export interface BenchRow {
  /** what was measured, e.g. "ledger: 6 options × 10 years, median" */
  name: string;
  value: number;
  /** unit of value, e.g. "ms", "evaluations/s", "KB gzip" */
  unit: string;
  /** the target, in the same unit, when the issue sets one */
  target?: number;
  /** "below" when value must stay under target, "above" when it must exceed it */
  direction?: 'below' | 'above';
  /** extra context, e.g. the ratio to a bare loop */
  note?: string;
}

/** A benchmark section: a named group of rows, run on demand. */
export interface BenchSuite {
  name: string;
  run(): Promise<BenchRow[]>;
}

/** Median of a list of numbers (the list is copied, not reordered). */
export function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** Times fn over `runs` repetitions after `warmup` untimed ones; returns each run's milliseconds. */
export function timeRuns(fn: () => void, runs: number, warmup = Math.min(runs, 20)): number[] {
  for (let i = 0; i < warmup; i++) fn();
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    fn();
    out.push(performance.now() - start);
  }
  return out;
}
