import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { formatNumber } from '../../../lib/format';
import type { AnalysisRun } from '../hooks/use-analysis-run';
import type { AnalysisKind } from '../worker/protocol';

/**
 * The Run button, a progress bar with a Cancel button while a run goes, and what happened to the
 * last run, in words. `blocked` names why the settings cannot run yet.
 */
export function RunControls<K extends AnalysisKind>({ run, onRun, label, unit, blocked }: {
  run: AnalysisRun<K> & { cancel(): void };
  onRun: () => void;
  label: string;
  /** what `done` counts, e.g. "draws" */
  unit: string;
  blocked: boolean;
}) {
  const running = run.status === 'running';
  const pct = run.total > 0 ? (100 * run.done) / run.total : 0;
  const where = run.where === 'worker' ? 'in a background worker' : 'on this page, in small steps';
  return (
    <div className="mt-3 space-y-2">
      <div className="flex flex-wrap items-center gap-3">
        <Button tone="primary" onClick={onRun} disabled={blocked} title={blocked ? 'Fix the settings marked above first' : undefined}>
          {label}
        </Button>
        {running ? (
          <>
            <div className="flex min-w-60 flex-1 items-center gap-2">
              <div
                role="progressbar"
                aria-label={`${label}: progress`}
                aria-valuemin={0}
                aria-valuemax={100}
                aria-valuenow={Math.round(pct)}
                className="h-2.5 flex-1 overflow-hidden rounded-full bg-spruce-100"
              >
                <div className="h-full rounded-full bg-spruce-600 transition-[width]" style={{ width: `${pct}%` }} />
              </div>
              <span className="figure w-12 text-right text-sm">{formatNumber(pct, 0)} %</span>
            </div>
            <Button tone="danger" size="sm" onClick={run.cancel}>Cancel</Button>
          </>
        ) : null}
      </div>
      <p role="status" aria-live="polite" className="min-h-5 text-xs text-ink-soft">
        {running ? `Working ${where}: ${formatNumber(run.done)} of ${formatNumber(run.total)} ${unit}.` : null}
        {run.status === 'finished' && run.ms !== null ? `Done in ${formatNumber(run.ms, 0)} ms, ${where}.` : null}
        {run.status === 'cancelled' ? `Cancelled after ${formatNumber(run.done)} of ${formatNumber(run.total)} ${unit}, ${where}${run.result ? '; the figures below are from the last run that finished' : ''}.` : null}
      </p>
      {run.status === 'invalid' ? (
        <Notice tone="caution" title={run.problemSource === 'scenario' ? 'The saved scenario does not compute' : 'These settings cannot run'}>
          <ul className="list-disc pl-5">
            {run.problems.slice(0, 8).map((p) => (
              <li key={`${p.path}:${p.message}`}><span className="figure">{p.path}</span> {p.message}</li>
            ))}
          </ul>
        </Notice>
      ) : null}
      {run.status === 'failed' ? <Notice tone="error" title="The run stopped with an error">{run.message}</Notice> : null}
    </div>
  );
}
