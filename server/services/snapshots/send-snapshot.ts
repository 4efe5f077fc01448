import type { SnapshotSummary } from '../../../src/contracts/api/snapshots';
import type { Models } from '../../db/models';
import type { UserRow } from '../../db/models/users';
import { AppError } from '../../http/app-error';
import type { Mailer } from '../../mail/mailer';
import { recordAudit } from '../../repos/audit';

export interface SendSnapshot {
  snapshot: SnapshotSummary;
  sender: UserRow;
  to: string[];
  note: string;
  /** where the web app is reached, e.g. https://parity.example.org */
  origin: string;
  ip: string | null;
}

/** The plain-text message that carries a share link. */
export function snapshotMailText(s: SendSnapshot): string {
  const link = `${s.origin}/s/${s.snapshot.id}`;
  return [
    `${s.sender.name} (${s.sender.email}) shares a read-only lighting comparison with you on Photon Parity:`,
    '',
    `  ${s.snapshot.title}`,
    '',
    ...(s.note ? [`Their note:`, '', ...s.note.split(/\r?\n/).map((l) => `  ${l}`), ''] : []),
    'Open it here; no account is needed:',
    '',
    link,
    '',
    s.snapshot.link.expiresAt ? `The link works until ${new Date(s.snapshot.link.expiresAt).toUTCString()}, unless it is withdrawn sooner.` : 'The link works until the people who published it withdraw it.',
    'The page recomputes every figure in your browser and says whether it reproduces.',
    'If you did not expect this message, ignore it.',
  ].join('\n');
}

/**
 * E-mails a live share link to each address separately (no recipient sees the others), with the
 * sender's note. Returns the addresses sent to; fails with 503 if the mail server refuses.
 */
export async function sendSnapshot(m: Models, mailer: Mailer, s: SendSnapshot): Promise<string[]> {
  if (s.snapshot.link.status !== 'live') {
    throw new AppError('conflict', `This link is ${s.snapshot.link.status}; publish a new snapshot to share it again.`, [{ path: 'link', message: s.snapshot.link.status }]);
  }
  const to = [...new Set(s.to)];
  const subject = `${s.sender.name} shares "${s.snapshot.title}" with you`;
  const text = snapshotMailText(s);
  const sent: string[] = [];
  try {
    for (const address of to) {
      await mailer.send({ to: address, subject, text });
      sent.push(address);
    }
  } catch (error) {
    throw new AppError('unavailable', `The mail server refused the message${sent.length ? ` after ${sent.length} of ${to.length} were sent` : ''}. Try again later.`, [], { cause: error });
  } finally {
    await recordAudit(m, { action: 'snapshot_sent', actorUserId: s.sender.id, workspaceId: s.snapshot.workspaceId, target: s.snapshot.id, ip: s.ip, details: { recipients: sent.length } });
  }
  return sent;
}
