import { createHash } from 'node:crypto';
import type { SnapshotLink, SnapshotLinkStatus } from '../../../src/contracts/api/snapshots';
import type { SnapshotLinkRow } from '../../db/models/snapshots';

/** SHA-256 of a share id, hex: the key public lookups use. */
export function hashSnapshotId(id: string): string {
  return createHash('sha256').update(id, 'utf8').digest('hex');
}

/** Live, revoked (withdrawn by an editor) or expired (its expiry has passed), at `now`. */
export function linkStatus(link: Pick<SnapshotLinkRow, 'expiresAt' | 'revokedAt'>, now = new Date()): SnapshotLinkStatus {
  if (link.revokedAt) return 'revoked';
  if (link.expiresAt && link.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'live';
}

/** The link as the API shows it. */
export function linkView(link: Pick<SnapshotLinkRow, 'expiresAt' | 'revokedAt'>, now = new Date()): SnapshotLink {
  return { status: linkStatus(link, now), expiresAt: link.expiresAt?.toISOString() ?? null, revokedAt: link.revokedAt?.toISOString() ?? null };
}
