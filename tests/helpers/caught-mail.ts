import type { Sequelize } from 'sequelize';
import type { CaughtMail } from '../../src/contracts/api/admin';
import { models } from '../../server/db/models';
import { listCaughtMail } from '../../server/repos/mail';

/** Reads what the real fake SMTP server caught, straight from its table. */
export class MailReader {
  constructor(private readonly sequelize: Sequelize) {}

  /** Every caught message, newest first. */
  all(): Promise<CaughtMail[]> {
    return listCaughtMail(models(this.sequelize));
  }

  /** The newest message to an address, waiting briefly for delivery to finish. */
  async latestTo(address: string, timeoutMs = 5000): Promise<CaughtMail> {
    const until = Date.now() + timeoutMs;
    for (;;) {
      const found = (await this.all()).find((m) => m.to.includes(address.toLowerCase()));
      if (found) return found;
      if (Date.now() > until) throw new Error(`no mail to ${address} was caught`);
      await new Promise((r) => setTimeout(r, 50));
    }
  }

  /** How many messages an address has received. */
  async countTo(address: string): Promise<number> {
    return (await this.all()).filter((m) => m.to.includes(address.toLowerCase())).length;
  }
}

/** The first http(s) link in a message's text that contains `contains`. */
export function linkIn(mail: CaughtMail, contains = ''): string {
  const links = mail.text.match(/https?:\/\/\S+/g) ?? [];
  const found = links.find((l) => l.includes(contains));
  if (!found) throw new Error(`no link containing "${contains}" in "${mail.subject}"`);
  return found;
}
