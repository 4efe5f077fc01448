import type { Sequelize, Transaction } from 'sequelize';
import { fixtureFieldsSchema } from '../../src/contracts/api/fixtures';
import { hashPassword } from '../auth/passwords';
import type { Config } from '../config';
import type { Example } from '../examples';
import { insertFixture } from '../repos/fixtures';
import { addMember } from '../repos/members';
import { insertScenario } from '../repos/scenarios';
import { insertUser } from '../repos/users';
import { insertWorkspace } from '../repos/workspaces';
import type { DemoStep } from './demo';
import { DEMO_ACCOUNTS, DEMO_WORKSPACE } from './demo-accounts';
import { models } from './models';

/** What the demo steps may use. */
export interface DemoContext {
  config: Config;
  examples: Example[];
}

/**
 * The steps that put the invented demo into a fresh database, in order: the demo accounts, the
 * co-operative's workspace with its owner, editor and viewer, a fixture library made of the
 * options in the shipped scenario files, and those scenarios.
 */
export function demoSteps({ examples }: DemoContext): DemoStep[] {
  return [
    async (sequelize: Sequelize, t: Transaction) => {
      const m = models(sequelize);
      const ids = new Map<string, string>();
      for (const a of DEMO_ACCOUNTS) {
        const user = await insertUser(m, { email: a.email, name: a.name, passwordHash: await hashPassword(a.password), isSiteAdmin: a.isSiteAdmin }, t);
        ids.set(a.email, user.id);
      }
      const owner = DEMO_ACCOUNTS.find((a) => a.role === 'owner');
      const ownerId = owner ? ids.get(owner.email) : undefined;
      if (!ownerId) throw new Error('the demo needs an owner');
      const workspace = await insertWorkspace(m, DEMO_WORKSPACE, ownerId, t);
      for (const a of DEMO_ACCOUNTS) {
        const id = ids.get(a.email);
        if (a.role && a.role !== 'owner' && id) await addMember(m, workspace.id, id, a.role, t);
      }

      const seen = new Set<string>();
      for (const example of examples) {
        for (const option of example.scenario.options) {
          if (seen.has(option.id)) continue;
          seen.add(option.id);
          const { id, ...rest } = option;
          const fields = fixtureFieldsSchema.parse({
            ...rest,
            key: id,
            dataSource: 'estimate',
            notes: `Invented figures for the demo, from "${example.title}".`,
          });
          await insertFixture(m, workspace.id, fields, ownerId, t);
        }
        await insertScenario(m, workspace.id, example.scenario, ownerId, { action: 'created', fromRevision: null }, t);
      }
    },
  ];
}
