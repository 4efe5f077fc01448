import { useMutation, useQueryClient } from '@tanstack/react-query';
import { measurementResponseSchema } from '../../../contracts/api/measurements';
import type { MeasurementKind } from '../../../contracts/api/measurements';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

/** What the upload form sends; empty text means "not given". */
export interface UploadMeasurementInput {
  wid: string;
  file: File;
  kind: MeasurementKind;
  label: string;
  unit: string;
  areaM2: string;
  wallWatts: string;
  fixtureId: string;
}

/** POST /api/workspaces/:wid/measurements (multipart): a 400 names the file's lines (`file, line 17`). */
export function uploadMeasurement({ wid, file, ...fields }: UploadMeasurementInput) {
  const form = new FormData();
  form.append('kind', fields.kind);
  form.append('label', fields.label);
  if (fields.kind === 'spectrum') form.append('unit', fields.unit);
  else {
    form.append('areaM2', fields.areaM2.trim().replace(',', '.'));
    form.append('wallWatts', fields.wallWatts.trim().replace(',', '.'));
  }
  form.append('fixtureId', fields.fixtureId);
  form.append('file', file, file.name);
  return apiJson(apiPaths.measurements(wid), measurementResponseSchema, { method: 'POST', body: form });
}

export function useUploadMeasurement() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: uploadMeasurement, onSuccess: (_d, v) => qc.invalidateQueries({ queryKey: ['measurements', 'list', v.wid] }) });
}
