import { copyFileSync, mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient } from '../helpers/api-client';
import { sampleScenario } from '../helpers/seed';
import { PLANCK_2856, download, upload } from '../measurements/uploads';
import { fileSha256, queryFile, runDbScript, runOnFile, sha256, signedIn, tableDigests } from './backup-tools';
import type { CommandRun, TableDigest } from './backup-tools';
import { startChildServer } from './child-server';
import type { ChildServer } from './child-server';

const dir = mkdtempSync(join(tmpdir(), 'pp-backup-'));
const livePath = join(dir, 'live.sqlite');
const backupPath = join(dir, 'copies', 'backup.sqlite');
const restoredPath = join(dir, 'restored', 'live.sqlite');
const servers: ChildServer[] = [];

// A grid with a byte-order mark, CRLF line ends and a non-ASCII file name, so the bytes must survive exactly.
const GRID = '\uFEFFx (m),y (m),ppfd\r\n0,0,410\r\n0.6,0,455.5\r\n0,0.6,390\r\n0.6,0.6,502\r\n';
const files = [
  { fields: { kind: 'grid', label: 'Bench 3 at 40 cm' }, name: 'bench é.csv', bytes: Buffer.from(GRID, 'utf8'), id: '' },
  { fields: { kind: 'spectrum', unit: 'w', label: 'Reference lamp' }, name: 'planck-2856.csv', bytes: Buffer.from(PLANCK_2856, 'utf8'), id: '' },
];
let wid = '';
let snapshot = { id: '', inputHash: '' };

/** One scenario save sent to the server while the backup runs. */
interface Save { id: string; title: string; revision: number; status: number; sentAt: number; answeredAt: number }
const saves: Save[] = [];
const backupRun = { startedAt: 0, endedAt: 0 };
let backup: CommandRun;
let backupDigests: Record<string, TableDigest> = {};

async function start(path: string): Promise<ChildServer> {
  const server = await startChildServer(path);
  servers.push(server);
  return server;
}
async function stop(server: ChildServer): Promise<void> {
  server.process.kill('SIGTERM');
  expect(await server.exited).toBe(0);
}

/** Keeps saving until `done()` is true: new scenarios from two loops, and edits of one scenario, one after another. */
async function streamOfSaves(owner: ApiClient, done: () => boolean): Promise<void> {
  const path = `/api/workspaces/${wid}/scenarios`;
  const record = (title: string, sentAt: number, reply: { status: number; body: { scenario?: { id: string; revision: number } } }) =>
    saves.push({ title, sentAt, answeredAt: performance.now(), status: reply.status, id: reply.body.scenario?.id ?? '', revision: reply.body.scenario?.revision ?? 0 });
  const creates = async (loop: number) => {
    for (let i = 0; !done(); i++) {
      const title = `Saved during backup ${loop}-${i}`;
      const sentAt = performance.now();
      record(title, sentAt, await owner.post(path, { document: sampleScenario(title) }));
    }
  };
  const edits = async () => {
    const made = await owner.post(path, { document: sampleScenario('Edited during backup') });
    let revision = made.body.scenario.revision as number;
    for (let i = 0; !done(); i++) {
      const title = `Edited during backup, edit ${i}`;
      const sentAt = performance.now();
      const reply = await owner.put(`${path}/${made.body.scenario.id}`, { document: sampleScenario(title) }, { headers: { 'if-match': String(revision) } });
      record(title, sentAt, reply);
      revision = reply.body.scenario?.revision ?? revision;
    }
  };
  await Promise.all([creates(1), creates(2), edits()]);
}

/** Resolves once at least `count` saves have been answered. */
async function answered(count: number): Promise<void> {
  while (saves.length < count) await new Promise((r) => setTimeout(r, 20));
}

beforeAll(async () => {
  const server = await start(livePath);
  const owner = await signedIn(server.base, 'owner');
  wid = (await owner.get('/api/me')).body.memberships.find((m: { role: string }) => m.role === 'owner').workspaceId;
  for (const f of files) {
    const reply = await upload(owner, wid, f.fields, { name: f.name, bytes: new Uint8Array(f.bytes) });
    if (reply.status !== 201) throw new Error(`upload failed: ${reply.status} ${reply.text}`);
    f.id = reply.body.measurement.id;
  }
  const made = await owner.post(`/api/workspaces/${wid}/scenarios`, { document: sampleScenario('Room to publish') });
  const published = await owner.post(`/api/workspaces/${wid}/scenarios/${made.body.scenario.id}/snapshots`, { notes: 'For the backup test.' });
  if (published.status !== 201) throw new Error(`publish failed: ${published.status} ${published.text}`);
  snapshot = { id: published.body.snapshot.id, inputHash: published.body.snapshot.inputHash };

  let finished = false;
  const stream = streamOfSaves(owner, () => finished);
  await Promise.race([answered(10), stream]);
  backupRun.startedAt = performance.now();
  backup = await runDbScript('db:backup', backupPath, livePath);
  backupRun.endedAt = performance.now();
  await Promise.race([answered(saves.length + 5), stream]);
  finished = true;
  await stream;
  await stop(server);
  backupDigests = await tableDigests(backupPath);
});

afterAll(() => {
  for (const s of servers) s.process.kill('SIGKILL');
});

describe('npm run db:backup against a running server', () => {
  it('exits 0 and says what it copied, while the server keeps answering every save 2xx', () => {
    expect(backup.code, backup.stderr).toBe(0);
    expect(backup.stdout).toBe(`backed up ${livePath} to ${backupPath} (integrity ok, ${backupDigests.SequelizeMeta?.rows} migrations)\n`);
    expect(saves.filter((s) => s.status < 200 || s.status > 299).map((s) => `${s.title}: ${s.status}`)).toEqual([]);
    const duringBackup = saves.filter((s) => s.answeredAt > backupRun.startedAt && s.sentAt < backupRun.endedAt);
    expect(duringBackup.length).toBeGreaterThan(5);
    // One self-contained file: no `.partial` left over, no write-ahead log beside it.
    expect(readdirSync(dirname(backupPath))).toEqual(['backup.sqlite']);
  });

  it('makes a copy that passes PRAGMA integrity_check and holds every save answered before the backup started', async () => {
    expect(await queryFile(backupPath, 'PRAGMA integrity_check')).toEqual([{ integrity_check: 'ok' }]);
    const before = saves.filter((s) => s.answeredAt < backupRun.startedAt);
    expect(before.length).toBeGreaterThan(5);
    const revisions = await queryFile<{ scenario_id: string; revision: number; title: string }>(backupPath, 'SELECT scenario_id, revision, title FROM scenario_revisions');
    const stored = new Set(revisions.map((r) => `${r.scenario_id} ${r.revision} ${r.title}`));
    expect(before.filter((s) => !stored.has(`${s.id} ${s.revision} ${s.title}`))).toEqual([]);
  });

  it('carries the uploaded files in the copy, byte for byte, and the published snapshot with its link', async () => {
    const rows = await queryFile<{ id: string; sha256: string; content: Buffer }>(backupPath, 'SELECT id, sha256, content FROM measurements');
    for (const f of files) {
      const row = rows.find((r) => r.id === f.id);
      expect(row?.content.equals(f.bytes)).toBe(true);
      expect(row?.sha256).toBe(sha256(f.bytes));
    }
    const snap = await queryFile(backupPath, 'SELECT s.input_hash, l.revoked_at FROM snapshots s JOIN snapshot_links l ON l.snapshot_id = s.id WHERE s.id = ?', [snapshot.id]);
    expect(snap).toEqual([{ input_hash: snapshot.inputHash, revoked_at: null }]);
  });
});

describe('npm run db:restore', () => {
  it('puts the copy into a fresh DATABASE_PATH with every table row for row the same as the backup', async () => {
    const run = await runDbScript('db:restore', backupPath, restoredPath);
    expect(run.code, run.stderr).toBe(0);
    expect(run.stdout).toBe(`restored ${backupPath} into ${restoredPath} (integrity ok, ${backupDigests.SequelizeMeta?.rows} migrations)\n`);
    expect(await tableDigests(restoredPath)).toEqual(backupDigests);
    for (const table of ['SequelizeMeta', 'users', 'scenarios', 'scenario_revisions', 'measurements', 'snapshots', 'snapshot_links']) expect(backupDigests[table]?.rows, table).toBeGreaterThan(0);
    expect(backupDigests.measurements?.rows).toBe(files.length);
  });

  it('gives a server started on the restored file the uploaded files byte for byte and the snapshot through its public link', { timeout: 90_000 }, async () => {
    const server = await start(restoredPath);
    const owner = await signedIn(server.base, 'owner');
    for (const f of files) {
      const got = await download(owner, wid, f.id);
      expect(got.status).toBe(200);
      expect(got.bytes.equals(f.bytes)).toBe(true);
      expect(sha256(got.bytes)).toBe(sha256(f.bytes));
    }
    const shared = await new ApiClient(server.base).get(`/api/snapshots/${snapshot.id}`);
    expect(shared.status).toBe(200);
    expect(shared.body.link.status).toBe('live');
    expect(shared.body.snapshot.inputHash).toBe(snapshot.inputHash);
    await stop(server);
    const after = await tableDigests(restoredPath);
    for (const table of ['scenarios', 'scenario_revisions', 'measurements', 'snapshots', 'snapshot_links']) expect(after[table], table).toEqual(backupDigests[table]);
  });

  it('refuses a file that is not a database, a database from a newer version and one with no migration applied, exit 1 with the reason, leaving the target as it was', { timeout: 60_000 }, async () => {
    const target = fileSha256(restoredPath);
    const junk = join(dir, 'junk.sqlite');
    writeFileSync(junk, 'this is not a database');
    const newer = join(dir, 'newer.sqlite');
    copyFileSync(backupPath, newer);
    await runOnFile(newer, "INSERT INTO SequelizeMeta (name) VALUES ('9999-from-a-later-version')");
    const empty = join(dir, 'empty.sqlite');
    copyFileSync(backupPath, empty);
    await runOnFile(empty, 'DELETE FROM SequelizeMeta');
    const [notDb, fromLater, noSchema] = await Promise.all([
      runDbScript('db:restore', junk, restoredPath),
      runDbScript('db:restore', newer, restoredPath),
      runDbScript('db:restore', empty, restoredPath),
    ]);
    expect(notDb.code).toBe(1);
    expect(notDb.stderr).toBe(`restore failed: ${junk} was not restored: not a Photon Parity database: SQLITE_NOTADB: file is not a database\n`);
    expect(fromLater.code).toBe(1);
    expect(fromLater.stderr).toBe(`restore failed: ${newer} was not restored: made by a newer version of Photon Parity (unknown migrations: 9999-from-a-later-version)\n`);
    expect(noSchema.code).toBe(1);
    expect(noSchema.stderr).toBe(`restore failed: ${empty} was not restored: not a Photon Parity database: no migration has been applied to it\n`);
    expect(notDb.stdout + fromLater.stdout + noSchema.stdout).toBe('');
    expect(fileSha256(restoredPath)).toBe(target);
  });
});
