import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import type { Measurement } from '../../../contracts/api/measurements';
import { Badge } from '../../../components/ui/badge';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { apiPaths } from '../../../lib/api-paths';
import { formatDateTime, formatNumber } from '../../../lib/format';
import { useMeasurements } from '../api/get-measurements';

/** The main figures of a measurement in one short line. */
export function keyFigures(m: Measurement): string {
  if (m.grid) {
    const g = m.grid;
    const eff = g.efficacyAtCanopy === undefined ? '' : ` · ${formatNumber(g.efficacyAtCanopy, 2)} µmol/J at the canopy`;
    return `${g.rows} × ${g.cols} · mean ${formatNumber(g.mean, 0)} µmol m⁻² s⁻¹ · min/mean ${formatNumber(g.minOverMean, 2)}${eff}`;
  }
  const s = m.spectrum!;
  const ppfd = s.ppfd === null ? 'relative' : `PPFD ${formatNumber(s.ppfd, 0)} µmol m⁻² s⁻¹`;
  return `${ppfd} · blue ${formatNumber(s.sharesPct.blue, 1)} % · red ${formatNumber(s.sharesPct.red, 1)} %${s.cctK === null ? '' : ` · ${formatNumber(s.cctK, 0)} K`}`;
}

/** Every measurement of the workspace, newest first, with its main figures and its file. */
export function MeasurementList({ workspaceId }: { workspaceId: string }) {
  const list = useMeasurements(workspaceId);
  if (list.isPending) return <LoadingState what="Loading the measurements" />;
  if (list.isError) return <ErrorState error={list.error} retry={() => void list.refetch()} />;
  if (list.data.measurements.length === 0) {
    return <EmptyState title="No measurements yet">Upload a PPFD grid or a spectrum to see its figures here.</EmptyState>;
  }
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" aria-label="Measurements">
        <thead>
          <tr className="border-b border-line-strong text-left text-ink-soft">
            <th scope="col" className="py-1 pr-3 font-medium">Measurement</th>
            <th scope="col" className="py-1 pr-3 font-medium">Kind</th>
            <th scope="col" className="py-1 pr-3 font-medium">Main figures</th>
            <th scope="col" className="py-1 pr-3 font-medium">Fixture</th>
            <th scope="col" className="py-1 pr-3 font-medium">File</th>
            <th scope="col" className="py-1 font-medium">Uploaded</th>
          </tr>
        </thead>
        <tbody>
          {list.data.measurements.map((m) => (
            <tr key={m.id} className="border-b border-line align-top">
              <th scope="row" className="py-1.5 pr-3 text-left font-medium">
                <Link className="text-spruce-700 underline underline-offset-2" to={paths.measurement.to(workspaceId, m.id)}>{m.label}</Link>
              </th>
              <td className="py-1.5 pr-3"><Badge tone={m.kind === 'grid' ? 'spruce' : 'gold'}>{m.kind === 'grid' ? 'PPFD grid' : 'spectrum'}</Badge></td>
              <td className="figure py-1.5 pr-3">{keyFigures(m)}</td>
              <td className="py-1.5 pr-3">{m.fixture?.label ?? <span className="text-ink-soft">—</span>}</td>
              <td className="py-1.5 pr-3">
                <a className="text-spruce-700 underline underline-offset-2" href={apiPaths.measurementFile(workspaceId, m.id)} download={m.fileName}>{m.fileName}</a>
                <span className="text-ink-soft"> · {formatNumber(m.byteSize / 1000, 1)} kB</span>
              </td>
              <td className="py-1.5 text-ink-soft">{formatDateTime(m.createdAt)} · {m.createdBy.name}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
