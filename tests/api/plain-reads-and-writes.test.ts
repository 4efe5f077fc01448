import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readRows } from '../../server/db/direct-read';
import { sampleScenario } from '../helpers/seed';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

describe('plain reads beside Sequelize queries', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp();
  });
  afterAll(() => app.close());

  it('let a save (a transaction, then a Sequelize read) finish while a steady stream of plain reads goes on', async () => {
    const owner = await app.signInAs('owner');
    const wid = (await owner.get('/api/me')).body.memberships[0].workspaceId as string;
    let reading = true;
    let reads = 0;
    const readers = Array.from({ length: 50 }, async () => {
      while (reading) {
        await readRows(app.running.sequelize, 'SELECT id FROM users WHERE id = ?', ['nobody']);
        reads++;
      }
    });
    await new Promise((r) => setTimeout(r, 200));
    const deadline = new Promise<'still waiting'>((r) => setTimeout(() => r('still waiting'), 8000));
    const saved = await Promise.race([owner.post(`/api/workspaces/${wid}/scenarios`, { document: sampleScenario('saved while reads stream') }).then((r) => r.status), deadline]);
    const readsBySave = reads;
    reading = false;
    await Promise.all(readers);
    // Before the plain reads had a connection of their own, this save waited for the stream to stop.
    expect(saved).toBe(201);
    expect(readsBySave).toBeGreaterThan(0);
  });
});
