import { createHash, randomBytes } from 'node:crypto';

/** A new link secret: 256 random bits as 43 characters of base64url. */
export function newInvitationToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What the database keeps instead of the secret. */
export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
