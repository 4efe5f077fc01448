import { createHash } from 'node:crypto';
import type { Measurement } from '../../../src/contracts/api/measurements';
import { ENGINE_VERSION } from '../../../src/engine/version';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { findFixtureRow } from '../../repos/fixtures';
import { insertMeasurement } from '../../repos/measurements';
import { measurementView } from './measurement-view';
import { readUpload } from './read-upload';
import type { UploadedFile } from './read-upload';

/** A file name safe to store and to send back in Content-Disposition: no folders, no control characters. */
export function cleanFileName(name: string, kind: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  // eslint-disable-next-line no-control-regex -- control characters are exactly what is removed
  const clean = base.replace(/[\u0000-\u001f\u007f]/g, '').trim().slice(0, 200);
  return clean || `${kind}.csv`;
}

/**
 * Checks an upload, reads it with the engine and stores the raw bytes, their SHA-256 and the
 * summary in one row. A refused file (400) stores nothing; so does an unknown fixture.
 */
export async function uploadMeasurement(m: Models, workspaceId: string, body: unknown, file: UploadedFile | undefined, userId: string): Promise<Measurement> {
  const { fields, summary } = readUpload(body, file);
  if (!file) throw new Error('readUpload accepted an upload without a file');
  return m.sequelize.transaction(async (transaction) => {
    if (fields.fixtureId && !(await findFixtureRow(m, workspaceId, fields.fixtureId, transaction))) {
      throw new AppError('invalid_input', 'The measurement was not stored: the fixture it names is not in this workspace.', [
        { path: 'fixtureId', message: 'there is no such fixture in this workspace' },
      ]);
    }
    const fileName = cleanFileName(file.originalname, fields.kind);
    const head = await insertMeasurement(
      m,
      {
        workspaceId,
        fixtureId: fields.fixtureId ?? null,
        kind: fields.kind,
        label: fields.label || fileName.slice(0, 120),
        fileName,
        contentType: (file.mimetype || 'text/csv').slice(0, 100),
        byteSize: file.buffer.length,
        sha256: createHash('sha256').update(file.buffer).digest('hex'),
        content: file.buffer,
        unit: fields.kind === 'spectrum' ? (fields.unit ?? null) : null,
        areaM2: fields.areaM2 ?? null,
        wallWatts: fields.wallWatts ?? null,
        summary: JSON.stringify(summary),
        engineVersion: ENGINE_VERSION,
        createdBy: userId,
      },
      transaction,
    );
    return measurementView(m, head, transaction);
  });
}
