import type { Sequelize } from 'sequelize';
import type { Role } from '../../src/contracts/api/common';
import { verifyPassword } from '../auth/passwords';
import { models } from './models';

/** One invented demo account. Its password is published in docs/demo-accounts.md, for local use only. */
export interface DemoAccount {
  email: string;
  name: string;
  password: string;
  /** Role in the demo workspace; none for the site admin. */
  role: Role | null;
  isSiteAdmin: boolean;
  /** Who the person is in the invented story. */
  part: string;
}

/** The invented co-operative's workspace. */
export const DEMO_WORKSPACE = { name: "Hollow Brook Growers' Co-operative", currency: 'EUR', unitSystem: 'si' as const };

/** Invented people of the demo; any likeness to real people is accidental. */
export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  { email: 'wren.aldous@hollowbrook.example', name: 'Wren Aldous', password: 'hollow-brook-grower-demo', role: 'owner', isSiteAdmin: false, part: 'grower, runs the co-operative’s two rooms' },
  { email: 'pim.okonkwo-lathe@lumen-advice.example', name: 'Pim Okonkwo-Lathe', password: 'lighting-consultant-demo', role: 'editor', isSiteAdmin: false, part: 'lighting consultant preparing the options' },
  { email: 'odile.farrant@hollowbrook.example', name: 'Odile Farrant', password: 'co-op-treasurer-demo', role: 'viewer', isSiteAdmin: false, part: 'client: the co-operative’s treasurer, reads the comparisons' },
  { email: 'admin@photon-parity.example', name: 'Site Admin', password: 'photon-parity-admin-demo', role: null, isSiteAdmin: true, part: 'site admin of this installation' },
];

/** E-mail addresses of demo accounts that still accept their published password. */
export async function publishedDemoPasswordsInUse(sequelize: Sequelize): Promise<string[]> {
  const { User } = models(sequelize);
  const found: string[] = [];
  for (const account of DEMO_ACCOUNTS) {
    const row = await User.findOne({ where: { email: account.email } });
    const hash = row?.get({ plain: true }).passwordHash;
    if (hash && (await verifyPassword(account.password, hash))) found.push(account.email);
  }
  return found;
}
