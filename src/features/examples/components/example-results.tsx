import { useMemo, useState } from 'react';
import { computeScenario } from '../../../engine/compute';
import type { UnitSystem } from '../../../engine/units-convert';
import { LedgerTable } from '../../../components/results/ledger-table';
import { ResultsCharts } from '../../../components/results/results-charts';
import { ResultsTable } from '../../../components/results/results-table';
import { SafetyNotes } from '../../../components/safety-notes';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { useExample } from '../api/get-example';
import { useExamples } from '../api/get-examples';

/**
 * A worked example: a demo scenario fetched from the API and computed here, in the browser, by the
 * same engine the server and the command line use.
 */
export function ExampleResults({ unitSystem = 'si' }: { unitSystem?: UnitSystem }) {
  const list = useExamples();
  const [chosen, setChosen] = useState<string | undefined>();
  const id = chosen ?? list.data?.examples[0]?.id;
  const example = useExample(id);
  const result = useMemo(() => (example.data ? computeScenario(example.data.scenario) : null), [example.data]);
  const [showCharts, setShowCharts] = useState(false);

  if (list.isPending) return <LoadingState what="Loading the worked examples" />;
  if (list.isError) return <ErrorState error={list.error} retry={() => void list.refetch()} />;
  if (list.data.examples.length === 0) return <p className="text-ink-soft">No worked examples are installed on this server.</p>;
  return (
    <div className="space-y-4">
      <div role="group" aria-label="Worked examples" className="flex flex-wrap gap-2">
        {list.data.examples.map((e) => (
          <Button key={e.id} size="sm" tone={e.id === id ? 'primary' : 'secondary'} aria-pressed={e.id === id} onClick={() => setChosen(e.id)}>
            {e.title}
          </Button>
        ))}
      </div>
      {example.isPending ? <LoadingState what="Loading the scenario" /> : null}
      {example.isError ? <ErrorState error={example.error} retry={() => void example.refetch()} /> : null}
      {example.data && result ? (
        <>
          <Panel title={example.data.title}>
            <ResultsTable scenario={example.data.scenario} result={result} unitSystem={unitSystem} />
            <p className="mt-2 text-xs text-ink-soft">
              Computed in this browser by engine {result.engineVersion}; input fingerprint <span className="figure">{result.inputHash.slice(0, 12)}</span>.
            </p>
          </Panel>
          <Panel title="Charts" actions={!showCharts ? <Button size="sm" onClick={() => setShowCharts(true)}>Show charts</Button> : null}>
            {showCharts ? <ResultsCharts scenario={example.data.scenario} result={result} unitSystem={unitSystem} /> : (
              <p className="text-sm text-ink-soft">The cost breakdown and the running total over the years, drawn on request.</p>
            )}
          </Panel>
          <Panel title="Year by year">
            <LedgerTable scenario={example.data.scenario} result={result} unitSystem={unitSystem} />
          </Panel>
          <SafetyNotes technologies={example.data.scenario.options.map((o) => o.technology)} />
        </>
      ) : null}
    </div>
  );
}
