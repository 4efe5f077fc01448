import type { Transaction } from 'sequelize';
import { readRow } from '../db/direct-read';
import type { Models } from '../db/models';
import type { SnapshotForkRow, SnapshotLinkRow, SnapshotRow } from '../db/models/snapshots';

/** Stores a new snapshot and its share link together. The snapshot row is never written again. */
export async function insertSnapshot(m: Models, row: Omit<SnapshotRow, 'createdAt'>, link: Pick<SnapshotLinkRow, 'idHash' | 'expiresAt'>, transaction: Transaction): Promise<SnapshotRow> {
  const created = await m.Snapshot.create({ ...row, createdAt: new Date() }, { transaction });
  await m.SnapshotLink.create({ snapshotId: row.id, idHash: link.idHash, expiresAt: link.expiresAt, revokedAt: null, revokedBy: null }, { transaction });
  return created.get({ plain: true });
}

/** A snapshot of a workspace, or null. */
export async function findSnapshotRow(m: Models, workspaceId: string, id: string): Promise<SnapshotRow | null> {
  const row = await m.Snapshot.findOne({ where: { workspaceId, id } });
  return row ? row.get({ plain: true }) : null;
}

/** A snapshot by id alone (public reads, after the link was checked). */
export async function loadSnapshotRow(m: Models, id: string): Promise<SnapshotRow | null> {
  const row = await m.Snapshot.findByPk(id);
  return row ? row.get({ plain: true }) : null;
}

/** The link state row of a snapshot. */
export async function findLinkRow(m: Models, snapshotId: string): Promise<SnapshotLinkRow | null> {
  const row = await m.SnapshotLink.findByPk(snapshotId);
  return row ? row.get({ plain: true }) : null;
}

/** The link found by the SHA-256 of its id: one indexed read, whether or not the id exists. */
export async function findLinkByHash(m: Models, idHash: string): Promise<StoredLink | null> {
  // One statement for both tables, so a known, a withdrawn and an unknown id cost the same round trip.
  const r = await readRow<{ snapshot_id: string | null; expires_at: string | null; revoked_at: string | Date | null; id_hash: string }>(
    m.sequelize,
    'SELECT snapshot_id, expires_at, revoked_at, id_hash FROM snapshot_links WHERE id_hash = ? ' +
      'UNION ALL SELECT NULL, NULL, withdrawn_at, id_hash FROM withdrawn_links WHERE id_hash = ?',
    [idHash, idHash],
  );
  if (!r) return null;
  return { idHash: r.id_hash, snapshotId: r.snapshot_id, expiresAt: r.expires_at ? new Date(r.expires_at) : null, revokedAt: r.revoked_at ? new Date(r.revoked_at) : null };
}

/**
 * A link as the public read finds it by the SHA-256 of its id: `snapshotId` is null when the
 * snapshot went with its deleted workspace, and then `revokedAt` is when that happened.
 */
export interface StoredLink extends Pick<SnapshotLinkRow, 'expiresAt' | 'revokedAt'> {
  idHash: string;
  snapshotId: string | null;
}

/** Keeps the id hashes of a workspace's links before the workspace (and its snapshots) is deleted. */
export async function withdrawWorkspaceLinks(m: Models, workspaceId: string, transaction: Transaction): Promise<void> {
  await m.sequelize.query(
    'INSERT INTO withdrawn_links (id_hash, withdrawn_at) SELECT l.id_hash, ? FROM snapshot_links l JOIN snapshots s ON s.id = l.snapshot_id WHERE s.workspace_id = ?',
    { replacements: [new Date(), workspaceId], transaction },
  );
}

/** A workspace's snapshots with their links, newest first; only one scenario's when `scenarioId` is given. */
export async function listSnapshotRows(m: Models, workspaceId: string, scenarioId?: string): Promise<Array<{ snapshot: SnapshotRow; link: SnapshotLinkRow }>> {
  const where = scenarioId ? { workspaceId, scenarioId } : { workspaceId };
  const rows = (await m.Snapshot.findAll({ where, order: [['createdAt', 'DESC'], ['id', 'ASC']] })).map((r) => r.get({ plain: true }));
  if (rows.length === 0) return [];
  const links = (await m.SnapshotLink.findAll({ where: { snapshotId: rows.map((r) => r.id) } })).map((l) => l.get({ plain: true }));
  const byId = new Map(links.map((l) => [l.snapshotId, l]));
  return rows.flatMap((snapshot) => {
    const link = byId.get(snapshot.id);
    return link ? [{ snapshot, link }] : [];
  });
}

/** Changes a link's expiry (the snapshot itself is untouched). */
export async function setLinkExpiry(m: Models, snapshotId: string, expiresAt: Date | null): Promise<void> {
  await m.SnapshotLink.update({ expiresAt }, { where: { snapshotId } });
}

/** Withdraws a link for good; revoking twice keeps the first time. */
export async function revokeLink(m: Models, snapshotId: string, userId: string): Promise<void> {
  await m.SnapshotLink.update({ revokedAt: new Date(), revokedBy: userId }, { where: { snapshotId, revokedAt: null } });
}

/** Records that a scenario was copied from a snapshot. */
export async function insertFork(m: Models, fork: Omit<SnapshotForkRow, 'createdAt'>, transaction: Transaction): Promise<void> {
  await m.SnapshotFork.create({ ...fork, createdAt: new Date() }, { transaction });
}

/** Which snapshot a scenario was forked from, if any. */
export async function findFork(m: Models, scenarioId: string): Promise<SnapshotForkRow | null> {
  const row = await m.SnapshotFork.findByPk(scenarioId);
  return row ? row.get({ plain: true }) : null;
}
