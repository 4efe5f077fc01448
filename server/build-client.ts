import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

const SOURCES = ['src', 'index.html', 'vite.config.ts', 'package.json', 'public'];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return readdirSync(path).reduce((max, name) => Math.max(max, newestMtime(join(path, name))), stat.mtimeMs);
}

/** True when dist/ is missing or older than any client source. */
export function clientIsStale(root: string, outDir = join(root, 'dist')): boolean {
  const built = join(outDir, 'index.html');
  if (!existsSync(built)) return true;
  const builtAt = statSync(built).mtimeMs;
  return SOURCES.some((s) => newestMtime(join(root, s)) > builtAt);
}

/** Builds the client with Vite when it is missing or stale; returns whether it built. */
export async function buildClientIfNeeded(root: string): Promise<boolean> {
  if (!clientIsStale(root)) return false;
  const { build } = await import('vite');
  await build({ root, logLevel: 'warn' });
  return true;
}
