import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import type { ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';

/** The real server in its own process, so the load generator does not share its event loop. */
export interface BenchServer {
  base: string;
  /** CPU time the server process has used so far, in ms (Linux /proc; NaN elsewhere). */
  cpuMs(): number;
  stop(): Promise<void>;
}

/** utime + stime of a process from /proc/<pid>/stat (fields 14 and 15, in clock ticks of 10 ms on Linux). */
function processCpuMs(pid: number | undefined): number {
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
    return (Number(fields[11]) + Number(fields[12])) * 10;
  } catch {
    return Number.NaN;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

/**
 * Starts `node --import tsx server/index.ts` (as `npm start` does, without building the client)
 * over the SQLite file `databasePath`, and waits until /api/health answers 200.
 */
export async function startBenchServer(databasePath: string): Promise<BenchServer> {
  const port = await freePort();
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, NODE_ENV: 'test', SKIP_CLIENT_BUILD: '1', LOG_LEVEL: 'warn', PORT: String(port), HOST: '127.0.0.1', DATABASE_PATH: databasePath },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const base = `http://127.0.0.1:${port}`;
  const until = Date.now() + 120_000;
  for (;;) {
    const ok = await fetch(`${base}/api/health`).then((r) => r.ok, () => false);
    if (ok) break;
    if (child.exitCode !== null || Date.now() > until) throw new Error('the server did not start');
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    base,
    cpuMs: () => processCpuMs(child.pid),
    stop: async () => {
      child.kill('SIGTERM');
      await exited;
    },
  };
}
