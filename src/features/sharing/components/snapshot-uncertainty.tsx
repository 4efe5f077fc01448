import { useMemo } from 'react';
import type { AnalysisSettings } from '../../../contracts/api/analysis';
import type { Scenario } from '../../../contracts/scenario';
import { numericInputs } from '../../../engine/sensitivity/inputs';
import { UncertaintyTable } from '../../../components/results/uncertainty-table';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { formatNumber } from '../../../lib/format';
import { inputLabel } from '../../../lib/scenario-labels';
import { checkUncertaintyDraft } from '../../../lib/uncertainty-draft';
import { useUncertaintyRerun } from '../hooks/use-uncertainty-rerun';

/**
 * The uncertainty settings frozen with a snapshot, in plain words, so that a reader can rerun the
 * same draws: each input's low, likely and high value, the number of draws and the seed. A button
 * reruns them here with this browser's engine.
 */
export function SnapshotUncertainty({ scenario: s, settings }: { scenario: Scenario; settings: AnalysisSettings['uncertainty'] }) {
  const units = useMemo(() => new Map(numericInputs(s).map((i) => [i.path, i.kind === 'money' ? `${s.currency} ${i.unit}` : i.unit])), [s]);
  const checked = useMemo(() => checkUncertaintyDraft(s, settings), [s, settings]);
  const { state, run } = useUncertaintyRerun(s, checked.ok ? checked.settings : null);
  return (
    <div className="space-y-3 text-sm" data-testid="snapshot-uncertainty">
      <p>
        The publisher kept an uncertainty run with this comparison. Each input below is drawn at random between its low and high
        value, most often near the likely value (a triangular distribution), while every other input stays as published.{' '}
        <strong>{settings.draws || '—'}</strong> draws come from a seeded generator with seed <strong className="figure">{settings.seed || '—'}</strong>: the same
        seed and ranges give the same numbers on every machine.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse">
          <caption className="sr-only">Inputs drawn in the uncertainty run</caption>
          <thead>
            <tr className="border-b border-line-strong text-right text-ink-soft">
              <th scope="col" className="text-left font-medium">Input</th>
              <th scope="col" className="px-2 font-medium">Low</th>
              <th scope="col" className="px-2 font-medium">Likely</th>
              <th scope="col" className="px-2 font-medium">High</th>
              <th scope="col" className="pl-2 text-left font-medium">Unit</th>
            </tr>
          </thead>
          <tbody>
            {settings.inputs.map((r) => (
              <tr key={r.path} className="border-b border-line text-right">
                <th scope="row" className="text-left font-normal">
                  {inputLabel(s, r.path)} <span className="figure text-xs text-ink-soft">({r.path})</span>
                </th>
                <td className="figure px-2">{r.low}</td>
                <td className="figure px-2">{r.likely}</td>
                <td className="figure px-2">{r.high}</td>
                <td className="pl-2 text-left">{units.get(r.path) ?? ''}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-ink-soft">
        To rerun it yourself, copy this comparison into a workspace of yours (below): the copy keeps these settings, seed included,
        and its sensitivity page runs them. Or run the same draws here.
      </p>
      {checked.ok ? (
        <div className="space-y-2">
          <Button size="sm" onClick={() => void run()} busy={state.status === 'running'}>
            {state.status === 'running' ? `Drawing… ${formatNumber((100 * state.done) / state.total, 0)} %` : 'Run these draws here'}
          </Button>
          {state.status === 'done' ? (
            <UncertaintyTable result={state.summary} scenario={s} label="Uncertainty run recomputed here" withMean={false} exact>
              Present values over {s.horizonYears} years. P10, P50 and P90: the present value that 10 %, 50 % and 90 % of the draws stay at or
              below (sample quantiles, definition 7 of Hyndman and Fan, 1996). Ties for cheapest go to the option listed first.
            </UncertaintyTable>
          ) : null}
          {state.status === 'failed' ? <Notice tone="error" title="The run stopped">{state.message}</Notice> : null}
        </div>
      ) : (
        <Notice tone="caution" title="These settings cannot be run as they stand">
          <ul className="list-disc pl-5">
            {checked.problems.map((p) => <li key={`${p.path}${p.message}`}>{p.path}: {p.message}</li>)}
          </ul>
        </Notice>
      )}
    </div>
  );
}

