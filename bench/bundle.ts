import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { buildClientIfNeeded } from '../server/build-client';
import type { BenchSuite } from './types';

const kb = (bytes: number) => bytes / 1024;
const gz = (path: string) => gzipSync(readFileSync(path), { level: 9 }).length;

/**
 * Weight of the built client: the JavaScript the first page load fetches (the entry script and the
 * chunks index.html preloads), every chunk together, and the largest lazy chunks, gzipped.
 */
export const bundleSuite: BenchSuite = {
  name: 'bundle',
  async run() {
    await buildClientIfNeeded(process.cwd());
    const dist = 'dist';
    const html = readFileSync(join(dist, 'index.html'), 'utf8');
    const firstLoad = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+\.js)"/g)].map((m) => m[1]!);
    const assets = readdirSync(join(dist, 'assets')).filter((f) => f.endsWith('.js'));
    const sizes = assets.map((f) => ({ file: f, gzip: gz(join(dist, 'assets', f)) })).sort((a, b) => b.gzip - a.gzip);
    const first = firstLoad.filter((f) => existsSync(join(dist, f))).reduce((sum, f) => sum + gz(join(dist, f)), 0);
    const all = sizes.reduce((sum, s) => sum + s.gzip, 0);
    return [
      { name: 'first page load: entry and preloaded chunks (gzip)', value: kb(first), unit: 'KB', target: 250, direction: 'below', note: `${firstLoad.length} files` },
      { name: 'every JavaScript chunk together (gzip)', value: kb(all), unit: 'KB', note: `${assets.length} chunks` },
      ...sizes.slice(0, 5).map((s) => ({ name: `largest chunk: ${s.file.replace(/-[\w-]{8}\.js$/, '.js')} (gzip)`, value: kb(s.gzip), unit: 'KB' })),
    ];
  },
};
