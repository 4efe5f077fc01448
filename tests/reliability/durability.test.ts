import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sqlite3 from 'sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import type { Scenario } from '../../src/contracts/scenario';
import { ApiClient } from '../helpers/api-client';
import { sampleScenario } from '../helpers/seed';
import { demoAccount } from '../helpers/test-app';
import { startChildServer } from './child-server';
import type { ChildServer } from './child-server';

const dir = mkdtempSync(join(tmpdir(), 'pp-durable-'));
const databasePath = join(dir, 'durable.sqlite');
const SAVES = 1000;
const EDITS = 100;
const KILL_AFTER_ANSWERS = 300;
let server: ChildServer | undefined;

afterAll(() => {
  server?.process.kill('SIGKILL');
});

interface Save {
  kind: 'create' | 'edit';
  document: Scenario;
  scenarioId?: string;
  status?: number;
  answeredId?: string;
  answeredRevision?: number;
}

async function signedInOwner(base: string): Promise<{ client: ApiClient; wid: string }> {
  const client = new ApiClient(base);
  const owner = demoAccount('owner');
  const reply = await client.signIn(owner.email, owner.password);
  if (reply.body.url.includes('error=')) throw new Error(`sign-in failed: ${reply.text}`);
  const workspace = await client.post('/api/workspaces', { name: 'Durability', currency: 'EUR', unitSystem: 'si' });
  if (workspace.status !== 201) throw new Error(`workspace not made: ${workspace.status} ${workspace.text}`);
  return { client, wid: workspace.body.workspace.id as string };
}

function integrityCheck(path: string): Promise<string[]> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(path, (openError) => {
      if (openError) return reject(openError);
      db.all<{ integrity_check: string }>('PRAGMA integrity_check', (error, rows) => {
        db.close();
        if (error) reject(error);
        else resolve(rows.map((r) => r.integrity_check));
      });
    });
  });
}

/** Runs `work` over `items`, at most `width` at a time. */
async function inBatches<T>(items: T[], width: number, work: (item: T) => Promise<void>): Promise<void> {
  for (let i = 0; i < items.length; i += width) await Promise.all(items.slice(i, i + width).map(work));
}

describe('durability of acknowledged saves', () => {
  it('keeps every save answered 2xx, whole, after SIGKILL part-way through 1,000 concurrent saves', { timeout: 240_000 }, async () => {
    server = await startChildServer(databasePath);
    const { client, wid } = await signedInOwner(server.base);
    const path = `/api/workspaces/${wid}/scenarios`;

    const targets: string[] = [];
    await inBatches(Array.from({ length: EDITS }, (_, i) => i), 25, async (i) => {
      const made = await client.post(path, { document: sampleScenario(`edit target ${i}`) });
      if (made.status !== 201) throw new Error(`setup save failed: ${made.status} ${made.text}`);
      targets[i] = made.body.scenario.id as string;
    });

    const saves: Save[] = Array.from({ length: SAVES }, (_, i): Save => {
      const document = { ...sampleScenario(i < EDITS ? `edited ${i}` : `created ${i}`), horizonYears: 1 + (i % 20) };
      return i < EDITS ? { kind: 'edit', document, scenarioId: targets[i] } : { kind: 'create', document };
    });
    let answered = 0;
    const victim = server;
    const sent = saves.map(async (save) => {
      try {
        const reply =
          save.kind === 'edit'
            ? await client.put(`${path}/${save.scenarioId}`, { document: save.document }, { headers: { 'if-match': '1' } })
            : await client.post(path, { document: save.document });
        save.status = reply.status;
        save.answeredId = reply.body?.scenario?.id;
        save.answeredRevision = reply.body?.scenario?.revision;
        if (++answered === KILL_AFTER_ANSWERS) victim.process.kill('SIGKILL');
      } catch {
        // The connection died with the process: this save was never acknowledged.
      }
    });
    await Promise.all(sent);
    expect(await victim.exited).toBe('SIGKILL');

    const acknowledged = saves.filter((s) => s.status !== undefined && s.status >= 200 && s.status < 300);
    const unanswered = saves.filter((s) => s.status === undefined);
    expect(acknowledged.length).toBeGreaterThanOrEqual(KILL_AFTER_ANSWERS - 10);
    expect(unanswered.length, 'the kill must land part-way, with saves still in flight').toBeGreaterThan(0);
    expect(saves.filter((s) => s.status !== undefined && s.status >= 500)).toEqual([]);
    expect(await integrityCheck(databasePath)).toEqual(['ok']);

    server = await startChildServer(databasePath);
    const reader = new ApiClient(server.base);
    const again = await reader.signIn(demoAccount('owner').email, demoAccount('owner').password);
    expect(again.body.url).not.toContain('error=');
    const missing: string[] = [];
    await inBatches(acknowledged, 25, async (save) => {
      const id = save.answeredId ?? '';
      const found = await reader.get(`${path}/${id}`);
      const expectedRevision = save.kind === 'edit' ? 2 : 1;
      if (found.status !== 200) missing.push(`${save.kind} ${id}: ${found.status}`);
      else if (found.body.scenario.revision !== expectedRevision || save.answeredRevision !== expectedRevision) missing.push(`${save.kind} ${id}: revision ${found.body.scenario.revision}`);
      else if (JSON.stringify(found.body.scenario.document) !== JSON.stringify(save.document)) missing.push(`${save.kind} ${id}: document differs`);
    });
    expect(missing).toEqual([]);
    expect(acknowledged.some((s) => s.kind === 'edit') && acknowledged.some((s) => s.kind === 'create')).toBe(true);

    server.process.kill('SIGTERM');
    expect(await server.exited).toBe(0);
    expect(await integrityCheck(databasePath)).toEqual(['ok']);
  });
});
