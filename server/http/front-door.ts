import type { IncomingMessage, RequestListener, ServerResponse } from 'node:http';
import type { Socket } from 'node:net';
import type { Logger } from 'pino';
import type { Models } from '../db/models';
import { snapshotDataId, snapshotReply } from '../routes/snapshot-data';
import { snapshotReader } from '../services/snapshots/read-snapshot';
import { describeError } from './error-handler';
import { trackRequest } from './request-id';

/** A request listener that can be told the server is shutting down. */
export type DrainableListener = RequestListener & { drain(): void };

/**
 * The server's request listener: the read of a shared snapshot's data, which every holder of a
 * published link makes and which needs no session, CSRF token, body or routing, is answered here
 * with the app's own security headers, request id, log line and error shape; every other request
 * goes to the Express app. Express's per-request work costs more than this whole read, so a link
 * opened by many readers at once stays fast (measured by `npm run bench -- sharing`).
 */
export function frontDoor(app: RequestListener, deps: { m: Models; log: Logger; headers: Array<[string, string]> }): DrainableListener {
  const reader = snapshotReader(deps.m);
  const security = deps.headers.flat();
  // Once shutting down, each answer closes its connection, those in flight included: a keep-alive
  // client goes elsewhere instead of sending more requests to a server about to close its database.
  // Connections (not requests) are tracked, so a busy keep-alive connection costs nothing per request.
  let draining = false;
  const connections = new Set<Socket>();
  const listener = (req: IncomingMessage, res: ServerResponse) => {
    if (draining) res.setHeader('Connection', 'close');
    else if (!connections.has(req.socket)) {
      const socket = req.socket;
      connections.add(socket);
      socket.once('close', () => connections.delete(socket));
    }
    const id = snapshotDataId(req);
    if (id === undefined) return void app(req, res);
    const requestId = trackRequest(deps.log, req, res, req.url ?? '', { setHeader: false });
    // One list of headers given to writeHead: Node writes it as it is, without the per-header work of setHeader.
    snapshotReply(reader, id, req).then(
      (reply) => {
        res.writeHead(reply.status, [...security, 'X-Request-Id', requestId, ...reply.headers]);
        res.end(reply.body ?? undefined);
      },
      (error: unknown) => {
        const { status, body } = describeError(error, requestId, deps.log);
        const text = JSON.stringify(body);
        res.writeHead(status, [...security, 'X-Request-Id', requestId, 'Content-Type', 'application/json; charset=utf-8', 'Content-Length', String(Buffer.byteLength(text))]);
        res.end(text);
      },
    );
  };
  const drain = () => {
    draining = true;
    for (const socket of connections) {
      // The response a connection is answering now: Node's own link from socket to response, the one
      // graceful-shutdown libraries read too; absent between requests.
      const res = (socket as Socket & { _httpMessage?: ServerResponse | null })._httpMessage;
      if (res && !res.headersSent) res.setHeader('Connection', 'close');
    }
  };
  return Object.assign(listener, { drain });
}
