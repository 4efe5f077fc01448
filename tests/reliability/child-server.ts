import { spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';

/** The real server (`server/index.ts` under tsx) running as a separate process, with everything it printed. */
export interface ChildServer {
  process: ChildProcess;
  base: string;
  port: number;
  /** Every line written to stdout and stderr so far (pino writes JSON lines to stdout). */
  output: string[];
  /** Resolves with the exit code (or the signal's name) once the process has ended. */
  exited: Promise<number | string>;
}

/** `node --import tsx server/index.ts`. Not the `tsx` launcher: it runs the server in a second process, which a SIGKILL of the launcher would leave running. */
export const NODE_COMMAND: readonly string[] = [process.execPath, '--import', 'tsx', 'server/index.ts'];

/**
 * Starts the server (by `command`, `node` by default) on a free port against `databasePath`, without
 * building the client, and resolves once it logs the port it serves on.
 */
export function startChildServer(databasePath: string, env: Record<string, string> = {}, timeoutMs = 90_000, command: readonly string[] = NODE_COMMAND): Promise<ChildServer> {
  const [program = process.execPath, ...args] = command;
  const child = spawn(program, args, {
    cwd: process.cwd(),
    env: { ...process.env, NODE_ENV: 'test', SKIP_CLIENT_BUILD: '1', LOG_LEVEL: 'info', PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: databasePath, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  const exited = new Promise<number | string>((resolve) => child.once('exit', (code, signal) => resolve(code ?? signal ?? -1)));
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`the server did not start within ${timeoutMs} ms:\n${output.join('\n')}`));
    }, timeoutMs);
    let pending = { stdout: '', stderr: '' };
    const take = (stream: 'stdout' | 'stderr') => (chunk: Buffer) => {
      const lines = (pending[stream] + chunk.toString('utf8')).split('\n');
      pending = { ...pending, [stream]: lines.pop() ?? '' };
      for (const line of lines) {
        output.push(line);
        const port = /"port":(\d+)/.exec(line)?.[1];
        if (port && line.includes('is serving')) {
          clearTimeout(timer);
          resolve({ process: child, base: `http://127.0.0.1:${port}`, port: Number(port), output, exited });
        }
      }
    };
    child.stdout.on('data', take('stdout'));
    child.stderr.on('data', take('stderr'));
    void exited.then((code) => {
      clearTimeout(timer);
      reject(new Error(`the server exited (${code}) before it was ready:\n${output.join('\n')}`));
    });
  });
}
