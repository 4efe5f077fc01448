import { Link, useNavigate } from 'react-router-dom';
import { paths } from '../../../app/paths';
import type { Measurement } from '../../../contracts/api/measurements';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Panel } from '../../../components/ui/panel';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';
import { formatDateTime, formatNumber } from '../../../lib/format';
import type { WorkspaceScope } from '../../../lib/workspace-context';
import { useDeleteMeasurement } from '../api/delete-measurement';
import { useMeasurement } from '../api/get-measurement';
import { GridView } from './grid-view';
import { SpectrumView } from './spectrum-view';
import { UseForFixture } from './use-for-fixture';

const UNIT_NAMES: Record<string, string> = { w: 'W m⁻² nm⁻¹', umol: 'µmol m⁻² s⁻¹ nm⁻¹', relative: 'relative spectral power' };

function FileFacts({ wid, m }: { wid: string; m: Measurement }) {
  return (
    <dl className="grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[max-content_1fr]">
      <dt className="text-ink-soft">File</dt>
      <dd>
        <a className="text-spruce-700 underline underline-offset-2" href={apiPaths.measurementFile(wid, m.id)} download={m.fileName}>{m.fileName}</a> · {formatNumber(m.byteSize, 0)} bytes
        {m.unit ? ` · values in ${UNIT_NAMES[m.unit]}` : ''}
      </dd>
      <dt className="text-ink-soft">SHA-256</dt>
      <dd className="figure break-all text-xs">{m.sha256}</dd>
      <dt className="text-ink-soft">Uploaded</dt>
      <dd>{formatDateTime(m.createdAt)} by {m.createdBy.name} · engine {m.engineVersion}</dd>
      <dt className="text-ink-soft">Fixture measured</dt>
      <dd>{m.fixture?.label ?? 'not named'}</dd>
      <dt className="text-ink-soft">Sets the figures of</dt>
      <dd>{m.feeds.length === 0 ? 'no fixture yet' : m.feeds.map((f) => f.label).join(', ')}</dd>
    </dl>
  );
}

/** One measurement: where its file is, its figures and pictures, and (for editors) feeding a fixture or deleting it. */
export function MeasurementDetail({ scope, measurementId }: { scope: WorkspaceScope; measurementId: string }) {
  const wid = scope.workspaceId;
  const q = useMeasurement(wid, measurementId);
  const remove = useDeleteMeasurement();
  const navigate = useNavigate();
  if (q.isPending) return <LoadingState what="Loading the measurement" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => void q.refetch()} />;
  const { measurement: m, data } = q.data;
  const erase = () => {
    const fed = m.feeds.length > 0 ? ` ${m.feeds.map((f) => f.label).join(', ')} will keep the measured figures but lose the link to this file.` : '';
    if (window.confirm(`Delete “${m.label}” and its file?${fed}`)) remove.mutate({ wid, mid: m.id }, { onSuccess: () => navigate(paths.measurements.to(wid)) });
  };
  return (
    <div className="space-y-4">
      <p className="text-sm"><Link className="text-spruce-700 underline underline-offset-2" to={paths.measurements.to(wid)}>← All measurements</Link></p>
      <h1 className="text-2xl font-semibold">{m.label} <span className="text-base font-normal text-ink-soft">· {m.kind === 'grid' ? 'PPFD grid' : 'spectrum'}</span></h1>
      <FileFacts wid={wid} m={m} />
      {m.notes.map((n) => <Notice key={n} tone="caution">{n}</Notice>)}
      <Panel title={m.kind === 'grid' ? 'Light over the canopy' : 'Spectrum'}>
        {m.grid ? <GridView grid={m.grid} data={data} areaM2={m.areaM2} wallWatts={m.wallWatts} /> : null}
        {m.spectrum ? <SpectrumView spectrum={m.spectrum} data={data} unit={m.unit} /> : null}
      </Panel>
      {scope.canEdit ? (
        <Panel title="Use for a library fixture">
          <UseForFixture workspaceId={wid} measurement={m} />
        </Panel>
      ) : null}
      {scope.canManage ? (
        <div>
          <Button tone="danger" busy={remove.isPending} onClick={erase}>Delete this measurement</Button>
          {remove.isError ? <Notice tone="error" className="mt-2">{errorMessage(remove.error)}</Notice> : null}
        </div>
      ) : null}
    </div>
  );
}
