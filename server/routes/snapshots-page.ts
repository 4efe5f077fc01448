import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Router } from 'express';
import type { Models } from '../db/models';
import { snapshotReader } from '../services/snapshots/read-snapshot';
import { plainLinkPage } from '../services/snapshots/withdrawn-page';

const SHAPE = /^[A-Za-z0-9_-]{1,64}$/;

/**
 * GET /s/:id, the share link a browser opens: the web app for a live link, and a plain page with
 * HTTP 410 for a revoked or expired one (404 for an unknown id), so the status is right even
 * before any script runs.
 */
export function snapshotPageRouter(m: Models, clientDir: string): Router {
  const router = Router();
  const reader = snapshotReader(m);
  const index = join(clientDir, 'index.html');
  router.get('/:id', async (req, res, next) => {
    res.set('X-Robots-Tag', 'noindex').set('Cache-Control', 'no-store');
    const found = SHAPE.test(req.params.id) ? await reader.lookup(req.params.id) : { found: false as const };
    if (!found.found) return void res.status(404).type('html').send(plainLinkPage(404, 'unknown'));
    if (found.link.status !== 'live') return void res.status(410).type('html').send(plainLinkPage(410, found.link.status));
    if (!existsSync(index)) return next();
    res.sendFile(index);
  });
  return router;
}
