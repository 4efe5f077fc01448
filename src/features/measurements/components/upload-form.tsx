import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '../../../app/paths';
import type { MeasurementKind } from '../../../contracts/api/measurements';
import { MEASUREMENT_FILE_LIMIT } from '../../../contracts/api/measurements';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Input, Select } from '../../../components/ui/input';
import { Notice } from '../../../components/ui/notice';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { useFixtureChoices } from '../api/get-fixture-choices';
import { useUploadMeasurement } from '../api/upload-measurement';
import { sortProblems } from '../lib/problems-by-line';
import { FileLines } from './file-lines';

const UNITS = [
  { value: 'w', label: 'W m⁻² nm⁻¹ (spectral irradiance)' },
  { value: 'umol', label: 'µmol m⁻² s⁻¹ nm⁻¹ (photon irradiance)' },
  { value: 'relative', label: 'relative spectral power (no PPFD)' },
];

/** Upload a grid or a spectrum. On a refusal every field keeps its value and each problem shows beside its field or line. */
export function UploadForm({ workspaceId }: { workspaceId: string }) {
  const navigate = useNavigate();
  const upload = useUploadMeasurement();
  const fixtures = useFixtureChoices(workspaceId);
  const [kind, setKind] = useState<MeasurementKind>('grid');
  const [file, setFile] = useState<File | null>(null);
  const [text, setText] = useState('');
  const [v, setV] = useState({ label: '', unit: 'w', areaM2: '', wallWatts: '', fixtureId: '' });
  const set = (k: keyof typeof v) => (e: { target: { value: string } }) => setV((old) => ({ ...old, [k]: e.target.value }));
  const problems = sortProblems(upload.error instanceof ApiError ? upload.error.fields : []);
  const fieldError = (k: string) => problems.fields.get(k)?.join('; ');
  const tooBig = file !== null && file.size > MEASUREMENT_FILE_LIMIT;

  const choose = (f: File | null) => {
    setFile(f);
    upload.reset();
    setText('');
    if (f && f.size <= MEASUREMENT_FILE_LIMIT) void f.text().then(setText);
  };
  const submit = () => {
    if (!file) return;
    upload.mutate({ wid: workspaceId, file, kind, ...v }, { onSuccess: (r) => navigate(paths.measurement.to(workspaceId, r.measurement.id)) });
  };

  return (
    <form className="space-y-3" onSubmit={(e) => { e.preventDefault(); submit(); }} aria-label="Upload a measurement">
      <fieldset className="flex flex-wrap gap-4">
        <legend className="mb-1 text-sm font-medium text-ink-soft">What the file holds</legend>
        {(['grid', 'spectrum'] as const).map((k) => (
          <label key={k} className="flex items-center gap-1.5">
            <input type="radio" name="kind" value={k} checked={kind === k} onChange={() => { setKind(k); upload.reset(); }} />
            {k === 'grid' ? 'PPFD grid (readings over the canopy)' : 'Spectrum (wavelength and value)'}
          </label>
        ))}
      </fieldset>
      <Field label="CSV file" error={problems.file.join('; ') || (tooBig ? `is ${file.size.toLocaleString('en')} bytes; the limit is ${MEASUREMENT_FILE_LIMIT.toLocaleString('en')} bytes (2 MB)` : undefined)}
        hint={kind === 'grid' ? 'Either one canopy row of readings per line (no header), or a header x, y, ppfd (m, m, µmol m⁻² s⁻¹) and one point per line.' : 'A header line, then wavelength in nm (ascending, steps of 10 nm or less, covering 400–700 nm) and the value. Readings below zero are counted as 0.'}>
        <Input type="file" accept=".csv,text/csv,text/plain" className="text-sm" onChange={(e) => choose(e.target.files?.[0] ?? null)} />
      </Field>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field label="Label" hint="Defaults to the file's name" error={fieldError('label')}>
          <Input value={v.label} onChange={set('label')} maxLength={120} />
        </Field>
        {kind === 'spectrum' ? (
          <Field label="Unit of the values" error={fieldError('unit')}>
            <Select value={v.unit} onChange={set('unit')}>{UNITS.map((u) => <option key={u.value} value={u.value}>{u.label}</option>)}</Select>
          </Field>
        ) : (
          <>
            <Field label="Area the grid covers" unit="m²" hint="Gives the canopy photon flux" error={fieldError('areaM2')}>
              <Input inputMode="decimal" value={v.areaM2} onChange={set('areaM2')} />
            </Field>
            <Field label="Wall watts of the lamps" unit="W" hint="With the area, gives the efficacy at the canopy" error={fieldError('wallWatts')}>
              <Input inputMode="decimal" value={v.wallWatts} onChange={set('wallWatts')} />
            </Field>
          </>
        )}
        <Field label="Fixture measured (optional)" error={fieldError('fixtureId')}>
          <Select value={v.fixtureId} onChange={set('fixtureId')}>
            <option value="">none</option>
            {(fixtures.data?.fixtures ?? []).map((f) => <option key={f.id} value={f.id}>{f.label}</option>)}
          </Select>
        </Field>
      </div>
      <Button type="submit" tone="primary" disabled={!file || tooBig} busy={upload.isPending}>Upload and read</Button>
      {upload.isError ? (
        <Notice tone="error" title="Nothing was stored">
          <p>{errorMessage(upload.error)}</p>
        </Notice>
      ) : null}
      <FileLines text={text} byLine={problems.byLine} />
    </form>
  );
}
