import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { modelReader, readRows } from '../../server/db/direct-read';
import { startTestApp } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

describe('reading rows with plain SQL (the hot read paths)', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp();
    // A disabled account, so a set date is compared beside the null ones and the booleans.
    const [user] = await app.m.User.findAll({ limit: 1 });
    await user!.update({ disabledAt: new Date('2026-03-04T05:06:07.089Z') });
  });
  afterAll(() => app.close());

  for (const name of ['User', 'Workspace', 'Membership', 'Scenario'] as const) {
    it(`gives every ${name} row exactly as Sequelize's findAll does`, async () => {
      const model = app.m[name] as unknown as Parameters<typeof modelReader>[0];
      const reader = modelReader(model, 't');
      const table = model.getTableName() as string;
      const viaSequelize = (await model.findAll({ order: [['createdAt', 'ASC']] })).map((r) => r.get({ plain: true }));
      const raw = await readRows<Record<string, unknown>>(app.running.sequelize, `SELECT ${reader.columns} FROM "${table}" t ORDER BY t."created_at" ASC`, []);
      expect(viaSequelize.length).toBeGreaterThan(0);
      expect(raw.map((r) => reader.toRow(r))).toEqual(viaSequelize);
    });
  }

  it('passes parameters and finds nothing for an unknown key', async () => {
    const reader = modelReader(app.m.User as unknown as Parameters<typeof modelReader>[0], 'u');
    expect(await readRows(app.running.sequelize, `SELECT ${reader.columns} FROM users u WHERE u.id = ?`, ['no-such-id'])).toEqual([]);
  });
});
