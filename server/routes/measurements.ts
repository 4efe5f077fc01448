import { Router } from 'express';
import type { RequestHandler } from 'express';
import multer from 'multer';
import { MEASUREMENT_FILE_LIMIT, applyMeasurementRequestSchema } from '../../src/contracts/api/measurements';
import { workspaceRole } from '../http/access';
import { AppError } from '../http/app-error';
import { accessOf, requireCaller } from '../http/context';
import { idParam, parseBody } from '../http/validate';
import { deleteMeasurementRow, findMeasurementFile, findMeasurementHead, listMeasurementHeads } from '../repos/measurements';
import { applyMeasurement } from '../services/measurements/apply-measurement';
import { measurementData, measurementView, measurementViews } from '../services/measurements/measurement-view';
import { uploadMeasurement } from '../services/measurements/upload-measurement';
import type { ApiDeps } from './api-deps';

const LIMIT_TEXT = `${MEASUREMENT_FILE_LIMIT.toLocaleString('en')} bytes (2 MB)`;

/** Multipart reading with the file kept in memory (it is stored in SQLite, never on disk); multer's limits become the one error shape. */
function receiveFile(): RequestHandler {
  const single = multer({
    storage: multer.memoryStorage(),
    // browsers send the file name as raw UTF-8 (RFC 7578 §4.2); busboy's default would read it as Latin-1
    defParamCharset: 'utf8',
    limits: { fileSize: MEASUREMENT_FILE_LIMIT, files: 1, fields: 12, fieldSize: 4096, parts: 13 },
  }).single('file');
  return (req, res, next) => {
    if (!req.is('multipart/form-data')) {
      return next(new AppError('unsupported_media_type', 'Send the measurement as multipart/form-data with the file in the field "file".'));
    }
    single(req, res, (error: unknown) => {
      if (!error) return next();
      const e = error as { code?: string; field?: string };
      if (e.code === 'LIMIT_FILE_SIZE') {
        // A file too large is one more bad file: 400 with the field named, like the others.
        return next(new AppError('invalid_input', `The file is larger than ${LIMIT_TEXT}; nothing was stored.`, [{ path: 'file', message: `is larger than ${LIMIT_TEXT}, the limit for a measurement file` }]));
      }
      if (e.code === 'LIMIT_UNEXPECTED_FILE' || e.code === 'LIMIT_FILE_COUNT') {
        return next(new AppError('invalid_input', 'Send one file, in the field "file".', [{ path: e.field ?? 'file', message: 'send one file, in the field "file"' }]));
      }
      if (typeof e.code === 'string' && e.code.startsWith('LIMIT_')) {
        return next(new AppError('invalid_input', 'The form has more or longer fields than a measurement needs.', [{ path: e.field ?? '(form)', message: 'is too long or one too many' }]));
      }
      // The rest come from reading the multipart body itself (cut short, no boundary, malformed
      // parts): files are held in memory, so no storage fault can reach this point.
      next(new AppError('invalid_input', 'The form could not be read; send it again as multipart/form-data with the file in the field "file".', [{ path: '(form)', message: 'is not a complete multipart form' }]));
    });
  };
}

/**
 * /api/workspaces/:wid/measurements: members list, read and download; editors and owners upload,
 * delete and feed a fixture from a measurement.
 */
export function measurementsRouter({ m, sequelize }: ApiDeps): Router {
  const router = Router({ mergeParams: true });
  const readers = workspaceRole(sequelize, 'viewer');
  const editors = workspaceRole(sequelize, 'editor');
  const found = async (wid: string, mid: string) => {
    const head = await findMeasurementHead(m, wid, mid);
    if (!head) throw new AppError('not_found', 'There is no such measurement in this workspace.');
    return head;
  };

  router.get('/', readers, async (req, res) => {
    res.json({ measurements: await measurementViews(m, await listMeasurementHeads(m, accessOf(req).workspace.id)) });
  });
  router.post('/', editors, receiveFile(), async (req, res) => {
    const measurement = await uploadMeasurement(m, accessOf(req).workspace.id, req.body, req.file, requireCaller(req).user.id);
    res.status(201).location(`${req.baseUrl}/${measurement.id}`).json({ measurement });
  });
  router.get('/:mid', readers, async (req, res) => {
    const head = await found(accessOf(req).workspace.id, idParam(req, 'mid'));
    res.json({ measurement: await measurementView(m, head), data: measurementData(head) });
  });
  router.get('/:mid/file', readers, async (req, res) => {
    const file = await findMeasurementFile(m, accessOf(req).workspace.id, idParam(req, 'mid'));
    if (!file) throw new AppError('not_found', 'There is no such measurement in this workspace.');
    // RFC 9530 digest of the bytes sent, so a reader can check the copy against the stored SHA-256
    res.set('Repr-Digest', `sha-256=:${Buffer.from(file.sha256, 'hex').toString('base64')}:`);
    res.set('Cache-Control', 'private, no-store');
    res.attachment(file.fileName).type('text/csv; charset=utf-8').send(file.content);
  });
  router.post('/:mid/apply', editors, async (req, res) => {
    const { fixtureId, shareOnArea } = parseBody(applyMeasurementRequestSchema, req, { optional: true });
    res.json(await applyMeasurement(m, accessOf(req).workspace.id, idParam(req, 'mid'), fixtureId, requireCaller(req).user.id, shareOnArea));
  });
  // Deleting is the owners' (issue: "owners manage members, invitations and deletion").
  router.delete('/:mid', workspaceRole(sequelize, 'owner'), async (req, res) => {
    const head = await found(accessOf(req).workspace.id, idParam(req, 'mid'));
    await deleteMeasurementRow(m, head.id);
    res.status(204).end();
  });
  return router;
}
