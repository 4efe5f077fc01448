import { Router } from 'express';
import type { Request, Response } from 'express';
import { forkSnapshotRequestSchema } from '../../src/contracts/api/snapshots';
import type { PublicSnapshot } from '../../src/contracts/api/snapshots';
import { clientIp, requireCaller } from '../http/context';
import { idParam, parseBody } from '../http/validate';
import { forkSnapshot } from '../services/snapshots/fork-snapshot';
import { snapshotReader } from '../services/snapshots/read-snapshot';
import { ledgerCsv, totalsCsv } from '../services/snapshots/results-csv';
import { snapshotReportPdf } from '../services/snapshots/snapshot-report';
import { publicOrigin } from './api-deps';
import type { ApiDeps } from './api-deps';

/** A file name made of the title's letters and digits. */
function fileStem(title: string): string {
  return title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'snapshot';
}

function attachment(res: Response, type: string, name: string): Response {
  return res.type(type).set('Content-Disposition', `attachment; filename="${name}"`).set('Cache-Control', 'private, no-cache');
}

/**
 * /api/snapshots/:id: anyone holding the link reads a live snapshot and its downloads without
 * signing in; an unknown id is 404, a revoked or expired one 410. Forking needs a session.
 */
export function publicSnapshotsRouter({ m, config }: ApiDeps): Router {
  const router = Router();
  const reader = snapshotReader(m);
  const open = async (req: Request): Promise<PublicSnapshot> => JSON.parse((await reader.open(idParam(req, 'id'))).snapshotJson) as PublicSnapshot;

  router.get('/:id', async (req, res) => {
    const id = idParam(req, 'id');
    const { link, snapshotJson } = await reader.open(id);
    // The snapshot never changes, so the link's state alone tells one reply from another; naming the
    // entity tag spares Express hashing the body on every request.
    res.type('application/json').set('Cache-Control', 'private, no-cache').set('ETag', `"${id}.${link.status}.${link.expiresAt ?? ''}"`);
    if (req.fresh) return void res.status(304).end();
    res.send(`{"link":${JSON.stringify(link)},"snapshot":${snapshotJson}}`);
  });
  router.get('/:id/scenario.json', async (req, res) => {
    const s = await open(req);
    attachment(res, 'application/json', `${fileStem(s.title)}.scenario.json`).send(`${JSON.stringify(s.scenario, null, 2)}\n`);
  });
  router.get('/:id/totals.csv', async (req, res) => {
    const s = await open(req);
    attachment(res, 'text/csv; charset=utf-8', `${fileStem(s.title)}-totals.csv`).send(totalsCsv(s.scenario, s.result));
  });
  router.get('/:id/ledger.csv', async (req, res) => {
    const s = await open(req);
    attachment(res, 'text/csv; charset=utf-8', `${fileStem(s.title)}-ledger.csv`).send(ledgerCsv(s.scenario, s.result));
  });
  router.get('/:id/report.pdf', async (req, res) => {
    const s = await open(req);
    const pdf = await snapshotReportPdf(s, `${publicOrigin(req, config)}/s/${s.id}`);
    attachment(res, 'application/pdf', `${fileStem(s.title)}-report.pdf`).send(Buffer.from(pdf));
  });
  router.post('/:id/fork', async (req, res) => {
    const caller = requireCaller(req);
    const input = parseBody(forkSnapshotRequestSchema, req);
    const snapshot = await open(req);
    const scenario = await forkSnapshot(m, { snapshot, workspaceId: input.workspaceId, title: input.title, userId: caller.user.id, ip: clientIp(req) });
    res.status(201).json({ scenario });
  });
  return router;
}
