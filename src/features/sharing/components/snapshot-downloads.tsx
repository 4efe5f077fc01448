import { useState } from 'react';
import type { PublicSnapshot } from '../../../contracts/api/snapshots';
import type { ReproduceReport } from '../../../engine/reproduce';
import { measurementLines } from '../../../contracts/api/snapshots';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/api-client';
import { sharingApi } from '../api/sharing-paths';
import { fileStem, saveFile } from '../lib/save-file';

const linkClass = 'rounded-md border border-line-strong bg-panel px-2 py-0.5 text-sm font-medium text-ink hover:bg-spruce-50';

/**
 * The snapshot as files: the scenario file (importable again), totals and yearly ledger as CSV, and
 * a PDF report built in this browser; the PDF code loads only when the report is asked for.
 */
export function SnapshotDownloads({ snapshot, reproduce }: { snapshot: PublicSnapshot; reproduce: ReproduceReport }) {
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const makePdf = async () => {
    setBusy(true);
    setProblem(null);
    try {
      const { buildReportPdf } = await import('../../../lib/report/build-report');
      const bytes = buildReportPdf({
        scenario: snapshot.scenario,
        result: snapshot.result,
        notes: snapshot.notes || undefined,
        link: window.location.href.split('#')[0] ?? '',
        generatedAt: new Date().toISOString(),
        reproduce,
        measurements: measurementLines(snapshot.measurements),
      });
      saveFile(`${fileStem(snapshot.title)}-report.pdf`, bytes.slice().buffer, 'application/pdf');
    } catch (error) {
      setProblem(errorMessage(error));
    } finally {
      setBusy(false);
    }
  };
  return (
    <div>
      <div className="flex flex-wrap items-center gap-2">
        <Button size="sm" tone="primary" busy={busy} onClick={() => void makePdf()}>
          PDF report
        </Button>
        <a className={linkClass} href={sharingApi.scenarioFile(snapshot.id)} download>
          Scenario file (JSON)
        </a>
        <a className={linkClass} href={sharingApi.totalsCsv(snapshot.id)} download>
          Totals (CSV)
        </a>
        <a className={linkClass} href={sharingApi.ledgerCsv(snapshot.id)} download>
          Yearly ledger (CSV)
        </a>
      </div>
      <p className="mt-1 text-xs text-ink-soft">
        The scenario file opens in Photon Parity and in its command line (<span className="figure">npm run cli -- compute FILE</span>).
      </p>
      {problem ? <p role="alert" className="mt-1 text-sm text-danger-700">{problem}</p> : null}
    </div>
  );
}
