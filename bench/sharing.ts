import { mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';
import { buildClientIfNeeded } from '../server/build-client';
import { DEMO_ACCOUNTS } from '../server/db/demo-accounts';
import { ApiClient } from '../tests/helpers/api-client';
import { startBenchServer } from './sharing-server';
import type { BenchRow, BenchSuite } from './types';

interface LoadResult {
  latency: { p99: number; average: number };
  requests: { average: number };
  non2xx: number;
  errors: number;
}
type Autocannon = (o: { url: string; connections: number; duration: number }) => Promise<LoadResult>;
const autocannon = createRequire(import.meta.url)('autocannon') as Autocannon;

const CONNECTIONS = 50;
const SECONDS = 10;

async function load(url: string, duration = SECONDS): Promise<LoadResult> {
  return autocannon({ url, connections: CONNECTIONS, duration });
}

/** The demo editor publishes Room A through the API, as the web client does. */
async function publishDemoSnapshot(base: string): Promise<string> {
  const editor = DEMO_ACCOUNTS.find((a) => a.role === 'editor')!;
  const c = new ApiClient(base);
  await c.signIn(editor.email, editor.password);
  const wid = (await c.get('/api/me')).body.memberships[0].workspaceId as string;
  const items = (await c.get(`/api/workspaces/${wid}/scenarios`)).body.items as Array<{ id: string; title: string }>;
  const sid = (items.find((s) => s.title.includes('Room A')) ?? items[0]!).id;
  const made = await c.post(`/api/workspaces/${wid}/scenarios/${sid}/snapshots`, { notes: 'benchmark' });
  if (made.status !== 201) throw new Error(`publishing failed: ${made.status} ${made.text}`);
  return made.body.snapshot.id as string;
}

/** Gzipped bytes of every script the public page loads in Debian's chromium until the network is idle. */
async function publicPageScriptBytes(url: string): Promise<{ gz: number; count: number }> {
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: ['--headless', '--no-sandbox', '--disable-gpu'] });
  try {
    const page = await browser.newPage();
    const sizes: number[] = [];
    page.on('response', async (r) => {
      if (!new URL(r.url()).pathname.endsWith('.js')) return;
      sizes.push(gzipSync(await r.body().catch(() => Buffer.alloc(0)), { level: 9 }).length);
    });
    await page.goto(url);
    await page.getByText('These figures reproduce').waitFor({ timeout: 30_000 });
    await page.waitForLoadState('networkidle');
    return { gz: sizes.reduce((a, b) => a + b, 0), count: sizes.length };
  } finally {
    await browser.close();
  }
}

/**
 * Sharing: autocannon with 50 connections against the real server (its own process) over a real
 * SQLite file, on a snapshot's public data and on /api/health in the same run; and the gzipped
 * JavaScript the public page loads.
 */
export const sharingSuite: BenchSuite = {
  name: 'sharing',
  async run() {
    const nodeEnv = process.env.NODE_ENV;
    process.env.NODE_ENV = 'production';
    await buildClientIfNeeded(process.cwd()).finally(() => (process.env.NODE_ENV = nodeEnv));
    const dir = mkdtempSync(join(tmpdir(), 'pp-bench-sharing-'));
    const server = await startBenchServer(join(dir, 'bench.sqlite'));
    try {
      const id = await publishDemoSnapshot(server.base);
      const snapshotUrl = `${server.base}/api/snapshots/${id}`;
      const unknownUrl = `${server.base}/api/snapshots/${id.slice(0, 20)}${id.endsWith('x') ? 'y' : 'x'}`;
      const bytes = (await (await fetch(snapshotUrl)).arrayBuffer()).byteLength;
      await load(snapshotUrl, 2);
      await load(`${server.base}/api/health`, 2);
      const health = await load(`${server.base}/api/health`);
      const cpuBefore = server.cpuMs();
      const snapshot = await load(snapshotUrl);
      const cpuPerRequest = (server.cpuMs() - cpuBefore) / (snapshot.requests.average * SECONDS);
      const unknown = await load(unknownUrl, 5);
      const bare = await load(`${server.base}/api/examples`, 5);
      const page = await publicPageScriptBytes(`${server.base}/s/${id}`);
      const ratio = snapshot.requests.average / health.requests.average;
      const rows: BenchRow[] = [
        { name: `GET snapshot data, ${CONNECTIONS} connections: p99`, value: snapshot.latency.p99, unit: 'ms', target: 20, direction: 'below', note: `mean ${snapshot.latency.average.toFixed(2)} ms, ${snapshot.non2xx} non-2xx, ${snapshot.errors} errors; body ${bytes} bytes` },
        { name: 'GET snapshot data: throughput', value: snapshot.requests.average, unit: 'req/s' },
        { name: 'GET snapshot data: server CPU per request', value: cpuPerRequest, unit: 'ms', note: `machine load average ${loadavg()[0]!.toFixed(1)} on ${cpus().length} CPUs` },
        { name: 'GET /api/health (same run): throughput', value: health.requests.average, unit: 'req/s', note: `p99 ${health.latency.p99} ms` },
        { name: 'GET /api/examples (no database; the stack alone): throughput', value: bare.requests.average, unit: 'req/s', note: `p99 ${bare.latency.p99} ms` },
        { name: 'snapshot throughput / health throughput', value: ratio, unit: '×', target: 0.5, direction: 'above' },
        { name: 'GET unknown id (404): mean latency', value: unknown.latency.average, unit: 'ms', note: `known id mean ${snapshot.latency.average.toFixed(2)} ms; p99 ${unknown.latency.p99} ms` },
        { name: `public page /s/:id: first-load JS (${page.count} scripts)`, value: page.gz / 1024, unit: 'KB gzip', target: 200, direction: 'below' },
      ];
      return rows;
    } finally {
      await server.stop();
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
