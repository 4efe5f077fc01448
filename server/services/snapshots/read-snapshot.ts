import { timingSafeEqual } from 'node:crypto';
import type { SnapshotLink } from '../../../src/contracts/api/snapshots';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { findLinkByHash, loadSnapshotRow } from '../../repos/snapshots';
import { hashSnapshotId, linkView } from './link-state';
import { TextLru } from './lru-cache';
import { publicSnapshot } from './snapshot-views';

/** Up to this many characters of serialized snapshots stay in memory (about 32 MB of text). */
const CACHE_CHARS = 32 * 1024 * 1024;
const NO_MATCH = Buffer.alloc(32);

/** What a share id leads to: nothing, or a snapshot with its link's current state. */
export type LinkLookup = { found: false } | { found: true; snapshotId: string; link: SnapshotLink };

/**
 * Public reads of snapshots by share id. Every lookup does the same work whether the id exists or
 * not: one indexed read by the id's SHA-256 and one constant-time comparison, so an unknown id
 * answers no slower than a known one. Snapshots never change, so their JSON is cached; the link's
 * state (revoked, expired) is read from the database on every request.
 */
export class SnapshotReader {
  private readonly cache = new TextLru(CACHE_CHARS);

  constructor(private readonly m: Models) {}

  /** The link state for a share id, read fresh. */
  async lookup(id: string): Promise<LinkLookup> {
    const wanted = hashSnapshotId(id);
    const row = await findLinkByHash(this.m, wanted);
    const stored = row ? Buffer.from(hashSnapshotId(row.snapshotId), 'hex') : NO_MATCH;
    const same = timingSafeEqual(stored, Buffer.from(wanted, 'hex'));
    if (!row || !same) return { found: false };
    return { found: true, snapshotId: row.snapshotId, link: linkView(row) };
  }

  /** The live link's state and the snapshot's serialized JSON; 404 for an unknown id, 410 once revoked or expired. */
  async open(id: string): Promise<{ link: SnapshotLink; snapshotJson: string }> {
    const found = await this.lookup(id);
    if (!found.found) throw new AppError('not_found', 'There is no shared snapshot at this link.');
    if (found.link.status !== 'live') throw goneError(found.link);
    return { link: found.link, snapshotJson: await this.snapshotJson(found.snapshotId) };
  }

  /** The serialized public snapshot, from the cache or the database. */
  async snapshotJson(snapshotId: string): Promise<string> {
    const cached = this.cache.get(snapshotId);
    if (cached !== undefined) return cached;
    const row = await loadSnapshotRow(this.m, snapshotId);
    if (!row) throw new AppError('not_found', 'There is no shared snapshot at this link.');
    const json = JSON.stringify(publicSnapshot(row));
    this.cache.set(snapshotId, json);
    return json;
  }
}

/** 410 for a withdrawn or expired link, saying which. */
export function goneError(link: SnapshotLink): AppError {
  return new AppError(
    'gone',
    link.status === 'revoked' ? 'This shared snapshot was withdrawn by the people who published it.' : 'This shared snapshot link has expired.',
    [{ path: 'link', message: link.status }],
  );
}

const readers = new WeakMap<Models, SnapshotReader>();

/** The one reader (and cache) of a database, shared by the data route and the /s/:id page. */
export function snapshotReader(m: Models): SnapshotReader {
  let reader = readers.get(m);
  if (!reader) {
    reader = new SnapshotReader(m);
    readers.set(m, reader);
  }
  return reader;
}
