import { mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { DEMO_ACCOUNTS } from '../server/db/demo-accounts';
import { ApiClient } from '../tests/helpers/api-client';
import { sampleScenario } from '../tests/helpers/seed';
import { startBenchServer } from './sharing-server';
import type { BenchRow, BenchSuite } from './types';
import { buildClientIfNeeded } from '../server/build-client';

interface CannonRequest {
  method: 'GET' | 'POST';
  path: string;
  headers?: Record<string, string>;
  body?: string;
}
interface CannonResult {
  latency: { p50: number; p99: number; average: number };
  requests: { average: number; total: number };
  errors: number;
  timeouts: number;
  '2xx': number;
  '4xx': number;
  '5xx': number;
  /** Responses outside 200–299, counted by autocannon. */
  non2xx: number;
}
type Autocannon = (o: { url: string; connections: number; duration: number; timeout: number; requests: CannonRequest[] }) => Promise<CannonResult>;
const autocannon = createRequire(import.meta.url)('autocannon') as Autocannon;

const SECONDS = Number(process.env.LOAD_SECONDS ?? 30);
const SCENARIOS = 20;

interface Route {
  name: string;
  connections: number;
  requests: CannonRequest[];
}

/** Signs in the demo owner, makes a workspace with scenarios and one published snapshot; returns the routes to load. */
async function prepare(base: string): Promise<Route[]> {
  const owner = DEMO_ACCOUNTS.find((a) => a.role === 'owner')!;
  const c = new ApiClient(base);
  await c.signIn(owner.email, owner.password);
  const wid = (await c.post('/api/workspaces', { name: 'Load', currency: 'EUR' })).body.workspace.id as string;
  const path = `/api/workspaces/${wid}/scenarios`;
  const ids: string[] = [];
  for (let i = 0; i < SCENARIOS; i++) ids.push((await c.post(path, { document: sampleScenario(`load ${i}`) })).body.scenario.id as string);
  const snap = await c.post(`${path}/${ids[0]}/snapshots`, { notes: 'load' });
  if (snap.status !== 201) throw new Error(`publishing failed: ${snap.status} ${snap.text}`);
  const session = { cookie: c.jar.header() ?? '' };
  const write = { ...session, 'x-csrf-token': c.csrfToken ?? '', 'content-type': 'application/json' };
  return [
    { name: 'GET …/scenarios/:sid/result', connections: 100, requests: ids.map((id) => ({ method: 'GET', path: `${path}/${id}/result`, headers: session })) },
    {
      // What a reader's browser asks for: the page, then its data (the page's scripts are static files).
      name: 'GET /s/:id and /api/snapshots/:id (public)',
      connections: 50,
      requests: [
        { method: 'GET', path: `/s/${snap.body.snapshot.id as string}` },
        { method: 'GET', path: `/api/snapshots/${snap.body.snapshot.id as string}` },
      ],
    },
    {
      name: 'POST …/scenarios (save)',
      connections: 50,
      requests: Array.from({ length: 10 }, (_, i) => ({ method: 'POST', path, headers: write, body: JSON.stringify({ document: sampleScenario(`saved under load ${i}`) }) })),
    },
  ];
}

/**
 * Load: 200 connections for 30 s against the real server in its own process over a fresh SQLite
 * file, split across result reads (100), public snapshot reads (50) and scenario saves (50), all at
 * once; per route: throughput, p50, p99, errors and 5xx.
 */
export const loadSuite: BenchSuite = {
  name: 'load',
  async run() {
    // The /s/:id page is the built client's index.html.
    await buildClientIfNeeded(process.cwd());
    const dir = mkdtempSync(join(tmpdir(), 'pp-bench-load-'));
    const server = await startBenchServer(join(dir, 'load.sqlite'));
    try {
      const routes = await prepare(server.base);
      const before = loadavg()[0]!;
      const results = await Promise.all(routes.map((r) => autocannon({ url: server.base, connections: r.connections, duration: SECONDS, timeout: 30, requests: r.requests })));
      const rows: BenchRow[] = [];
      const total = routes.reduce((n, r) => n + r.connections, 0);
      results.forEach((res, i) => {
        const name = routes[i]!.name;
        const note = `${res.requests.total} requests, ${res['2xx']} 2xx, ${res['4xx']} 4xx, ${res['5xx']} 5xx, ${res.errors} errors (${res.timeouts} timeouts)`;
        rows.push({ name: `${name}: throughput`, value: res.requests.average, unit: 'req/s', note });
        rows.push({ name: `${name}: p50`, value: res.latency.p50, unit: 'ms' });
        rows.push({ name: `${name}: p99`, value: res.latency.p99, unit: 'ms' });
      });
      rows.push({ name: `errors and timeouts, all routes (${total} connections, ${SECONDS} s)`, value: results.reduce((n, r) => n + r.errors, 0), unit: 'count', target: 1, direction: 'below' });
      rows.push({ name: 'responses of 500 or above, all routes', value: results.reduce((n, r) => n + r['5xx'], 0), unit: 'count', target: 1, direction: 'below' });
      // Every request here is valid, so anything but a 2xx (a 4xx included) is a failure too.
      rows.push({ name: 'responses other than 2xx, all routes', value: results.reduce((n, r) => n + r.non2xx, 0), unit: 'count', target: 1, direction: 'below' });
      rows.push({ name: 'machine load average (1 min) before / after', value: loadavg()[0]!, unit: '', note: `before ${before.toFixed(1)}` });
      return rows;
    } finally {
      await server.stop();
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
