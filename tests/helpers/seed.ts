import { randomUUID } from 'node:crypto';
import type { Role } from '../../src/contracts/api/common';
import { fixtureFieldsSchema } from '../../src/contracts/api/fixtures';
import { parseScenario } from '../../src/engine';
import type { Scenario } from '../../src/contracts/scenario';
import type { Models } from '../../server/db/models';
import { insertFixture } from '../../server/repos/fixtures';
import { insertInvitation } from '../../server/repos/invitations';
import { addMember } from '../../server/repos/members';
import { insertScenario } from '../../server/repos/scenarios';
import { findUserByEmail, insertUser } from '../../server/repos/users';
import { insertWorkspace } from '../../server/repos/workspaces';
import { hashInvitationToken, newInvitationToken } from '../../server/services/invitations/invitation-token';

/** A small valid scenario (invented figures), for tests that need one. */
export function sampleScenario(title = 'Test room'): Scenario {
  const checked = parseScenario({
    format: 'photon-parity/scenario@1',
    title,
    currency: 'EUR',
    canopy: { lengthM: 4, widthM: 2 },
    target: { ppfd: 600 },
    schedule: [{ label: 'flower', hoursPerDay: 12, daysPerYear: 300 }],
    horizonYears: 3,
    electricity: { pricePerKwh: '0.25' },
    baseline: 'a',
    options: [
      { id: 'a', label: 'Option A', technology: 'hps', wallWatts: 600, photonEfficacy: 1.2, fixturePrice: '200' },
      { id: 'b', label: 'Option B', technology: 'led', wallWatts: 500, photonEfficacy: 2.5, fixturePrice: '600' },
    ],
  });
  if (!checked.ok) throw new Error(JSON.stringify(checked.problems));
  return checked.value;
}

/** What seedWorkspace made: ids to build paths from, and the secret of a pending invitation. */
export interface SeededWorkspace {
  workspaceId: string;
  fixtureId: string;
  scenarioId: string;
  invitationId: string;
  invitationToken: string;
  extraMemberId: string;
}

/**
 * Writes a workspace straight into the database (the way the demo loader does): the given people
 * with their roles, one more viewer, a fixture, a scenario at revision 1 and a pending invitation.
 */
export async function seedWorkspace(m: Models, people: Array<{ email: string; role: Role }>): Promise<SeededWorkspace> {
  return m.sequelize.transaction(async (t) => {
    const ids = [];
    for (const p of people) {
      const user = await findUserByEmail(m, p.email, t);
      if (!user) throw new Error(`no account ${p.email}`);
      ids.push({ id: user.id, role: p.role });
    }
    const owner = ids.find((p) => p.role === 'owner');
    if (!owner) throw new Error('a seeded workspace needs an owner');
    const ws = await insertWorkspace(m, { name: `Seeded ${randomUUID().slice(0, 8)}`, currency: 'EUR', unitSystem: 'si' }, owner.id, t);
    for (const p of ids) if (p !== owner) await addMember(m, ws.id, p.id, p.role, t);
    const extra = await insertUser(m, { email: `extra-${randomUUID()}@example.org`, name: 'Extra Member', passwordHash: null }, t);
    await addMember(m, ws.id, extra.id, 'viewer', t);
    const fixture = await insertFixture(
      m,
      ws.id,
      fixtureFieldsSchema.parse({ key: 'seed-led', label: 'Seed LED', technology: 'led', wallWatts: 300, photonEfficacy: 2.6, fixturePrice: '400' }),
      owner.id,
      t,
    );
    const scenario = await insertScenario(m, ws.id, sampleScenario(), owner.id, { action: 'created', fromRevision: null }, t);
    const token = newInvitationToken();
    const invitation = await insertInvitation(
      m,
      { workspaceId: ws.id, email: `invitee-${randomUUID()}@example.org`, role: 'viewer', tokenHash: hashInvitationToken(token), invitedBy: owner.id, expiresAt: new Date(Date.now() + 86_400_000) },
      t,
    );
    return { workspaceId: ws.id, fixtureId: fixture.id, scenarioId: scenario.id, invitationId: invitation.id, invitationToken: token, extraMemberId: extra.id };
  });
}

/** A pending invitation for `email` into a new workspace of a new owner; returns the link's secret. */
export async function seedInvitationFor(m: Models, email: string, role: Role = 'viewer'): Promise<string> {
  const owner = await insertUser(m, { email: `inviter-${randomUUID()}@example.org`, name: 'Inviting Owner', passwordHash: null });
  const seeded = await seedWorkspace(m, [{ email: owner.email, role: 'owner' }]);
  const token = newInvitationToken();
  await insertInvitation(m, {
    workspaceId: seeded.workspaceId,
    email: email.toLowerCase(),
    role,
    tokenHash: hashInvitationToken(token),
    invitedBy: owner.id,
    expiresAt: new Date(Date.now() + 86_400_000),
  });
  return token;
}
