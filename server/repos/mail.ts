import type { CaughtMail } from '../../src/contracts/api/admin';
import type { Models } from '../db/models';

/** Caught messages, newest first. */
export async function listCaughtMail(m: Models, limit = 200): Promise<CaughtMail[]> {
  const rows = await m.CaughtMail.findAll({ order: [['id', 'DESC']], limit });
  return rows.map((r) => {
    const c = r.get({ plain: true });
    return { id: c.id, receivedAt: c.receivedAt.toISOString(), from: c.mailFrom, to: JSON.parse(c.rcptTo) as string[], subject: c.subject, text: c.text };
  });
}
