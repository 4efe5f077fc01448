import { memo, useDeferredValue, useEffect, useMemo, useState } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import type { Scenario, ScenarioInput } from '../../../contracts/scenario';
import type { ScenarioResult } from '../../../engine/result-types';
import type { UnitSystem } from '../../../engine/units-convert';
import { LedgerTable } from '../../../components/results/ledger-table';
import { ResultsCharts } from '../../../components/results/results-charts';
import { ResultsTable } from '../../../components/results/results-table';
import { Notice } from '../../../components/ui/notice';
import { Panel } from '../../../components/ui/panel';
import { LoadingState } from '../../../components/ui/states';
import { formatNumber } from '../../../lib/format';
import { useLiveResults } from '../hooks/use-live-results';
import { CircuitPlanner } from './circuit-planner';

/**
 * Results that follow the form as it is typed: this component alone subscribes to every change, so
 * the inputs never re-render for it, and the engine runs in a worker.
 */
export function LiveResults({ form, unitSystem }: { form: UseFormReturn<ScenarioInput, unknown, unknown>; unitSystem: UnitSystem }) {
  const [doc, setDoc] = useState<ScenarioInput>(() => structuredClone(form.getValues()));
  useEffect(
    () => form.subscribe({ formState: { values: true }, callback: ({ values }) => setDoc(structuredClone(values)) }),
    [form],
  );
  const live = useLiveResults(doc);
  // Drawing new results is interruptible: a keystroke arriving meanwhile is handled first.
  const latest = useMemo(() => (live.result && live.scenario ? { result: live.result, scenario: live.scenario } : null), [live.result, live.scenario]);
  const shownPair = useDeferredValue(latest);
  const result = shownPair?.result ?? null;
  const scenario = shownPair?.scenario ?? null;
  return (
    <div className="space-y-4" aria-live="off">
      <div role="status" aria-live="polite" className="min-h-5 text-xs text-ink-soft" data-testid="compute-status">
        {live.busy ? 'Computing…' : live.ms !== null ? `Computed in ${formatNumber(live.ms, 1)} ms (${live.where === 'worker' ? 'in a background worker' : 'on this page'}).` : null}
      </div>
      {live.problems.length > 0 ? (
        <Notice tone="caution" title="The results wait for these inputs">
          <ul className="list-disc pl-5">
            {live.problems.slice(0, 8).map((p) => (
              <li key={`${p.path}:${p.message}`}><span className="figure">{p.path}</span> {p.message}</li>
            ))}
          </ul>
          {result ? <p className="mt-1">The figures below are from the last inputs that worked.</p> : null}
        </Notice>
      ) : null}
      {live.failure ? <Notice tone="error" title="The engine could not compute this">{live.failure}</Notice> : null}
      {!result || !scenario ? (
        live.problems.length === 0 ? <LoadingState what="Computing" /> : null
      ) : (
        <ResultsView scenario={scenario} result={result} unitSystem={unitSystem} />
      )}
    </div>
  );
}

/** The result panels; memoised so that keystrokes re-render them only when a new result arrives. */
const ResultsView = memo(function ResultsView({ scenario, result, unitSystem }: { scenario: Scenario; result: ScenarioResult; unitSystem: UnitSystem }) {
  return (
    <>
      <Panel title="Leveled comparison">
        <ResultsTable scenario={scenario} result={result} unitSystem={unitSystem} />
      </Panel>
      <Panel title="Charts">
        <ResultsCharts scenario={scenario} result={result} unitSystem={unitSystem} />
      </Panel>
      <Panel title="Year by year">
        <LedgerTable scenario={scenario} result={result} unitSystem={unitSystem} />
      </Panel>
      <Panel title="Branch circuits">
        <CircuitPlanner scenario={scenario} result={result} unitSystem={unitSystem} />
      </Panel>
    </>
  );
});
