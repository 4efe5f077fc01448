import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import type { Models } from '../db/models';
import { snapshotReader } from '../services/snapshots/read-snapshot';
import type { SnapshotReader } from '../services/snapshots/read-snapshot';

/** GET /api/snapshots/<id> with an optional trailing slash and query; ids are checked as idParam does. */
const PATH = /^\/api\/snapshots\/([A-Za-z0-9_-]{1,64})\/?(?:\?.*)?$/;
const CLOSE = Buffer.from('}');

/** The share id when this request reads a snapshot's data (GET or HEAD /api/snapshots/:id), else undefined. */
export function snapshotDataId(req: IncomingMessage): string | undefined {
  if (req.method !== 'GET' && req.method !== 'HEAD') return undefined;
  return PATH.exec(req.url ?? '')?.[1];
}

/** True when the client's If-None-Match names this entity tag (RFC 9110, section 13.1.2: weak comparison). */
function notModified(req: IncomingMessage, etag: string): boolean {
  const header = req.headers['if-none-match'];
  if (!header) return false;
  return header.trim() === '*' || header.split(',').some((tag) => tag.trim().replace(/^W\//, '') === etag);
}

/**
 * Answers GET /api/snapshots/:id: the link's state and the snapshot, written from the cached bytes
 * without copying them; rejects with the AppError for an unknown (404), withdrawn or expired (410)
 * link. Anyone with the link may read it and a GET changes nothing, so no session is needed.
 */
export async function writeSnapshotData(reader: SnapshotReader, id: string, req: IncomingMessage, res: ServerResponse): Promise<void> {
  const { link, snapshotBytes } = await reader.open(id);
  // The snapshot never changes, so the link's state alone tells one reply from another.
  const etag = `"${id}.${link.status}.${link.expiresAt ?? ''}"`;
  res.setHeader('Cache-Control', 'private, no-cache');
  res.setHeader('ETag', etag);
  if (notModified(req, etag)) {
    res.statusCode = 304;
    return void res.end();
  }
  const head = Buffer.from(`{"link":${JSON.stringify(link)},"snapshot":`, 'utf8');
  res.setHeader('Content-Type', 'application/json; charset=utf-8');
  res.setHeader('Content-Length', head.length + snapshotBytes.length + CLOSE.length);
  if (req.method === 'HEAD') return void res.end();
  res.cork();
  res.write(head);
  res.write(snapshotBytes);
  res.end(CLOSE);
}

/** The same read as Express middleware, for an app used without the front door (see server/http/front-door.ts). */
export function snapshotDataRoute(m: Models): RequestHandler {
  const reader = snapshotReader(m);
  return (req, res, next) => {
    const id = snapshotDataId(req);
    if (id === undefined) return next();
    writeSnapshotData(reader, id, req, res).catch(next);
  };
}
