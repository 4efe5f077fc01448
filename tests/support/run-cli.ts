import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../', import.meta.url));
const tsx = fileURLToPath(new URL('../../node_modules/.bin/tsx', import.meta.url));

/** Runs the CLI as a user would (a separate process) and returns its exit code and output. */
export function runCli(args: string[]): { code: number; stdout: string; stderr: string } {
  const r = spawnSync(tsx, ['src/cli/main.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 });
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}
