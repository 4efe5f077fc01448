import { Router } from 'express';
import type { Request } from 'express';
import { saveAnalysisRequestSchema } from '../../src/contracts/api/analysis';
import { workspaceRole } from '../http/access';
import { AppError } from '../http/app-error';
import { accessOf, requireCaller } from '../http/context';
import { idParam, parseBody } from '../http/validate';
import { findScenarioRow } from '../repos/scenarios';
import { findAnalysis, saveAnalysis } from '../repos/scenario-analysis';
import type { ApiDeps } from './api-deps';

/** /api/workspaces/:wid/scenarios/:sid/analysis: members read the kept sensitivity settings; editors and owners replace them. */
export function scenarioAnalysisRouter({ m, sequelize }: ApiDeps): Router {
  const router = Router({ mergeParams: true });
  const scenarioId = async (req: Request) => {
    const row = await findScenarioRow(m, accessOf(req).workspace.id, idParam(req, 'sid'));
    if (!row) throw new AppError('not_found', 'There is no such scenario in this workspace.');
    return row.id;
  };
  router.get('/', workspaceRole(sequelize, 'viewer'), async (req, res) => {
    res.json(await findAnalysis(m, await scenarioId(req)));
  });
  router.put('/', workspaceRole(sequelize, 'editor'), async (req, res) => {
    const { settings } = parseBody(saveAnalysisRequestSchema, req);
    res.json(await saveAnalysis(m, await scenarioId(req), settings, requireCaller(req).user.id));
  });
  return router;
}
