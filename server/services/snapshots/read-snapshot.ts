import { timingSafeEqual } from 'node:crypto';
import type { SnapshotLink } from '../../../src/contracts/api/snapshots';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { findLinkByHash, loadSnapshotRow } from '../../repos/snapshots';
import { hashSnapshotId, linkView } from './link-state';
import { SizedLru } from './lru-cache';
import { publicSnapshot } from './snapshot-views';

/** Up to this many bytes of serialized snapshots stay in memory. */
const CACHE_BYTES = 32 * 1024 * 1024;
const NO_MATCH = Buffer.alloc(32);

/** What a share id leads to: nothing, or a snapshot with its link's current state. */
export type LinkLookup = { found: false } | { found: true; snapshotId: string | null; link: SnapshotLink };

/**
 * Public reads of snapshots by share id. Every lookup does the same work whether the id exists or
 * not: one indexed read by the id's SHA-256 and one constant-time comparison, so an unknown id
 * answers no slower than a known one. Snapshots never change, so their JSON is cached (as UTF-8
 * bytes, ready to send); the link's state (revoked, expired) is read from the database for every
 * request, except that requests for one id arriving while its read is under way share that read.
 */
export class SnapshotReader {
  private readonly cache = new SizedLru<Buffer>(CACHE_BYTES);
  private readonly reading = new Map<string, { generation: number; lookup: Promise<LinkLookup> }>();
  private generation = 0;

  constructor(private readonly m: Models) {}

  /**
   * The link state for a share id, read fresh. A read already under way for the same id is shared,
   * unless a link changed in this process since it began (see `linksChanged`): a reader never sees
   * a state older than the revocation or expiry its own instance has answered.
   */
  lookup(id: string): Promise<LinkLookup> {
    const wanted = hashSnapshotId(id);
    const shared = this.reading.get(wanted);
    if (shared && shared.generation === this.generation) return shared.lookup;
    const lookup = this.read(wanted).finally(() => {
      if (this.reading.get(wanted)?.lookup === lookup) this.reading.delete(wanted);
    });
    this.reading.set(wanted, { generation: this.generation, lookup });
    return lookup;
  }

  /** Called after a link is revoked or its expiry changes, so later lookups read the new state. */
  linksChanged(): void {
    this.generation++;
  }

  private async read(wanted: string): Promise<LinkLookup> {
    const row = await findLinkByHash(this.m, wanted);
    const stored = row ? Buffer.from(row.idHash, 'hex') : NO_MATCH;
    const same = stored.length === NO_MATCH.length && timingSafeEqual(stored, Buffer.from(wanted, 'hex'));
    if (!row || !same) return { found: false };
    // A link whose snapshot went with its workspace reads as revoked: withdrawn by its publishers.
    if (row.snapshotId === null) return { found: true, snapshotId: null, link: linkView({ expiresAt: null, revokedAt: row.revokedAt ?? new Date(0) }) };
    return { found: true, snapshotId: row.snapshotId, link: linkView(row) };
  }

  /** The live link's state and the snapshot's serialized JSON (UTF-8); 404 for an unknown id, 410 once revoked or expired. */
  async open(id: string): Promise<{ link: SnapshotLink; snapshotBytes: Buffer }> {
    const found = await this.lookup(id);
    if (!found.found) throw new AppError('not_found', 'There is no shared snapshot at this link.');
    if (found.link.status !== 'live' || found.snapshotId === null) throw goneError(found.link);
    return { link: found.link, snapshotBytes: await this.snapshotBytes(found.snapshotId) };
  }

  /** The serialized public snapshot as UTF-8 JSON, from the cache or the database. */
  async snapshotBytes(snapshotId: string): Promise<Buffer> {
    const cached = this.cache.get(snapshotId);
    if (cached !== undefined) return cached;
    const row = await loadSnapshotRow(this.m, snapshotId);
    if (!row) throw new AppError('not_found', 'There is no shared snapshot at this link.');
    const bytes = Buffer.from(JSON.stringify(publicSnapshot(row)), 'utf8');
    this.cache.set(snapshotId, bytes);
    return bytes;
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
