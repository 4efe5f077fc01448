import { writeFileSync, mkdirSync } from 'node:fs';
import { suites } from './suites';
import type { BenchRow } from './types';

const only = process.argv.slice(2);
const report: Record<string, BenchRow[]> = {};
for (const suite of suites) {
  if (only.length && !only.includes(suite.name)) continue;
  report[suite.name] = await suite.run();
}

const verdict = (r: BenchRow) =>
  r.target === undefined ? '' : (r.direction === 'above' ? r.value > r.target : r.value < r.target) ? 'meets' : 'MISSES';
const fmt = (v: number) => (Math.abs(v) >= 1000 ? Math.round(v).toLocaleString('en') : v.toPrecision(4));
for (const [name, rows] of Object.entries(report)) {
  process.stdout.write(`\n${name}\n`);
  for (const r of rows) {
    const target = r.target === undefined ? '' : ` (target ${r.direction === 'above' ? '>' : '<'} ${fmt(r.target)})`;
    process.stdout.write(`  ${r.name.padEnd(60)} ${fmt(r.value).padStart(12)} ${r.unit}${target} ${verdict(r)}${r.note ? `  ${r.note}` : ''}\n`);
  }
}
const json = JSON.stringify({ machine: { node: process.version, cpus: (await import('node:os')).cpus().length }, report }, null, 2);
mkdirSync('bench/out', { recursive: true });
writeFileSync('bench/out/latest.json', json);
process.stdout.write(`\n${json}\n`);
