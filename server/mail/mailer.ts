import { createTransport } from 'nodemailer';
import type { Transporter } from 'nodemailer';

/** One plain-text message. */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

/** Sends mail over SMTP; the only way the product sends anything. */
export interface Mailer {
  /** The SMTP URL, also handed to Auth.js's e-mail provider. */
  readonly smtpUrl: string;
  readonly from: string;
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

export const DEFAULT_FROM = 'Photon Parity <no-reply@photon-parity.invalid>';

/** A nodemailer SMTP transport to `smtpUrl` (the local fake server in development and tests). */
export function createMailer(smtpUrl: string, from = process.env.MAIL_FROM ?? DEFAULT_FROM): Mailer {
  const transport: Transporter = createTransport(smtpUrl);
  return {
    smtpUrl,
    from,
    async send(mail) {
      const info = await transport.sendMail({ from, to: mail.to, subject: mail.subject, text: mail.text });
      const refused = [...(info.rejected ?? []), ...(info.pending ?? [])];
      if (refused.length) throw new Error(`the mail server refused ${refused.length} recipient(s)`);
    },
    close: () => transport.close(),
  };
}
