import type { IncomingMessage } from 'node:http';
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

/** A reply ready to write: its status, its headers as a flat name, value, name, value… list, and its body. */
export interface SnapshotReply {
  status: 200 | 304;
  headers: string[];
  /** null for 304 and for HEAD */
  body: Buffer | null;
}

/**
 * The answer to GET /api/snapshots/:id: the link's state and the snapshot, or 304 when the client
 * holds it already; rejects with the AppError for an unknown (404), withdrawn or expired (410)
 * link. Anyone with the link may read it and a GET changes nothing, so no session is needed.
 */
export async function snapshotReply(reader: SnapshotReader, id: string, req: IncomingMessage): Promise<SnapshotReply> {
  const { link, snapshotBytes } = await reader.open(id);
  // The snapshot never changes, so the link's state alone tells one reply from another.
  const etag = `"${id}.${link.status}.${link.expiresAt ?? ''}"`;
  const caching = ['Cache-Control', 'private, no-cache', 'ETag', etag];
  if (notModified(req, etag)) return { status: 304, headers: caching, body: null };
  const body = Buffer.concat([Buffer.from(`{"link":${JSON.stringify(link)},"snapshot":`, 'utf8'), snapshotBytes, CLOSE]);
  const headers = [...caching, 'Content-Type', 'application/json; charset=utf-8', 'Content-Length', String(body.length)];
  return { status: 200, headers, body: req.method === 'HEAD' ? null : body };
}

/** The same read as Express middleware, for an app used without the front door (see server/http/front-door.ts). */
export function snapshotDataRoute(m: Models): RequestHandler {
  const reader = snapshotReader(m);
  return (req, res, next) => {
    const id = snapshotDataId(req);
    if (id === undefined) return next();
    snapshotReply(reader, id, req).then((reply) => {
      res.writeHead(reply.status, reply.headers);
      res.end(reply.body ?? undefined);
    }, next);
  };
}
