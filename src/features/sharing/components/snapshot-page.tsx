import { useMemo, useState } from 'react';
import type { SnapshotResponse } from '../../../contracts/api/snapshots';
import { measurementLines } from '../../../contracts/api/snapshots';
import { computeScenario } from '../../../engine/compute';
import { scenarioHash } from '../../../engine/canonical';
import { compareResults } from '../../../engine/reproduce';
import { LedgerTable } from '../../../components/results/ledger-table';
import { ResultsCharts } from '../../../components/results/results-charts';
import { ResultsTable } from '../../../components/results/results-table';
import { SafetyNotes } from '../../../components/safety-notes';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { formatDateTime } from '../../../lib/format';
import { ForkPanel } from './fork-panel';
import { ReproduceNotice } from './reproduce-notice';
import { SnapshotDownloads } from './snapshot-downloads';
import { SnapshotInputs } from './snapshot-inputs';
import { SnapshotUncertainty } from './snapshot-uncertainty';

/**
 * The read-only page of a shared snapshot. The figures shown are the published ones; the page
 * recomputes them from the stored inputs with this browser's engine and says whether they reproduce.
 */
export function SnapshotPage({ data }: { data: SnapshotResponse }) {
  const { snapshot: s, link } = data;
  const check = useMemo(() => {
    const recomputed = computeScenario(s.scenario);
    return { report: compareResults(s.result, recomputed), hashMatches: scenarioHash(s.scenario) === s.inputHash };
  }, [s]);
  const view = { scenario: s.scenario, result: s.result, unitSystem: 'si' as const };
  const lines = measurementLines(s.measurements);
  const [charts, setCharts] = useState(false);
  return (
    <div className="space-y-4">
      <header>
        <p className="text-sm text-ink-soft">Shared snapshot, read only</p>
        <h1 className="text-2xl font-semibold tracking-tight">{s.title}</h1>
        <p className="mt-1 text-sm text-ink-soft">
          Published by {s.publishedBy} on {formatDateTime(s.createdAt)}
          {link.expiresAt ? `; the link works until ${formatDateTime(link.expiresAt)}` : ''}. Input SHA-256{' '}
          <span className="figure break-all">{s.inputHash}</span>.
        </p>
      </header>
      <ReproduceNotice report={check.report} hashMatches={check.hashMatches} />
      {s.notes ? (
        <Panel title="Notes from the publisher">
          <p className="whitespace-pre-wrap">{s.notes}</p>
        </Panel>
      ) : null}
      <Panel title="Results">
        <ResultsTable {...view} />
      </Panel>
      <Panel title="Charts" actions={charts ? null : <Button size="sm" onClick={() => setCharts(true)}>Draw the charts</Button>}>
        {charts ? <ResultsCharts {...view} /> : <p className="text-sm text-ink-soft">What each option costs by part, and the running total year by year; drawn on request.</p>}
      </Panel>
      <Panel title="Year by year">
        <LedgerTable {...view} />
      </Panel>
      <Panel title="What the figures assume">
        <SnapshotInputs scenario={s.scenario} fixtures={s.fixtures} />
      </Panel>
      {s.analysis ? (
        <Panel title="Uncertainty run kept with it">
          <SnapshotUncertainty scenario={s.scenario} settings={s.analysis.uncertainty} />
        </Panel>
      ) : null}
      <Panel title="Measurements">
        {lines.length ? (
          <ul className="list-disc pl-5 text-sm">
            {lines.map((l) => <li key={l}>{l}</li>)}
          </ul>
        ) : (
          <p className="text-sm text-ink-soft">No measurements were attached to this comparison; the option figures are as entered.</p>
        )}
      </Panel>
      <SafetyNotes technologies={s.scenario.options.map((o) => o.technology)} circuits />
      <Panel title="Take it with you">
        <SnapshotDownloads snapshot={s} reproduce={check.report} />
      </Panel>
      <Panel title="Work on a copy">
        <ForkPanel snapshotId={s.id} />
      </Panel>
    </div>
  );
}
