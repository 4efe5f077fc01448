import { lazy, Suspense, useMemo } from 'react';
import type { Scenario } from '../../../../contracts/scenario';
import { Button } from '../../../../components/ui/button';
import { Panel } from '../../../../components/ui/panel';
import { LoadingState } from '../../../../components/ui/states';
import { formatNumber } from '../../../../lib/format';
import { useAnalysisRun } from '../../hooks/use-analysis-run';
import { freshSeed } from '../../lib/analysis-settings';
import type { UncertaintyDraft } from '../../lib/analysis-settings';
import { uncertaintyErrors, uncertaintyFromDraft } from '../../lib/draft-settings';
import type { OptionStyle } from '../../lib/option-colours';
import { DraftNumber } from '../draft-field';
import { RunControls } from '../run-controls';
import { UncertaintyInputs } from './uncertainty-inputs';
import { UncertaintyTable } from '../../../../components/results/uncertainty-table';

const UncertaintyCharts = lazy(() => import('./uncertainty-charts'));

/** Uncertainty run: inputs drawn from low–likely–high ranges with a seed anyone can reuse to get the same figures. */
export function UncertaintySection({ scenario, draft, onDraft, styles }: {
  scenario: Scenario;
  draft: UncertaintyDraft;
  onDraft: (d: UncertaintyDraft) => void;
  styles: OptionStyle[];
}) {
  const run = useAnalysisRun('uncertainty');
  const errors = useMemo(() => uncertaintyErrors(scenario, draft), [scenario, draft]);
  const set = (patch: Partial<UncertaintyDraft>) => onDraft({ ...draft, ...patch });
  const result = run.result;
  return (
    <Panel title="How sure is the cheapest pick">
      <p className="mb-3 max-w-3xl text-sm text-ink-soft">
        Each chosen input is drawn from a triangle between its low, likely and high values, independently of the others, and every draw
        prices all options. The draws come from a seeded generator (xoshiro128**), so the same seed and settings give the same figures on
        every machine. The suggested ranges are only a start: set your own.
      </p>
      <UncertaintyInputs scenario={scenario} rows={draft.inputs} onRows={(inputs) => set({ inputs })} errors={errors} />
      <div className="mt-3 flex max-w-4xl flex-wrap items-end gap-3">
        <DraftNumber label="Draws" value={draft.draws} onChange={(draws) => set({ draws })} error={errors.draws} />
        <DraftNumber label="Seed" value={draft.seed} onChange={(seed) => set({ seed })} error={errors.seed} width="w-48" hint="Any whole number 0 to 4294967295" />
        <Button size="sm" className="mb-5" onClick={() => set({ seed: String(freshSeed()) })}>New seed</Button>
      </div>
      <RunControls run={run} label="Run the draws" unit="draws" blocked={Object.keys(errors).length > 0} onRun={() => run.run(scenario, uncertaintyFromDraft(draft))} />
      {result ? (
        <div className="mt-2 space-y-3" data-testid="uncertainty-result">
          <p className="text-sm">
            <span className="figure">{formatNumber(result.draws)}</span> draws with seed <span className="figure" data-testid="uncertainty-seed">{result.seed}</span>.
          </p>
          <Suspense fallback={<LoadingState what="Drawing the charts" />}>
            <UncertaintyCharts result={result} scenario={scenario} styles={styles} />
          </Suspense>
          <UncertaintyTable result={result} scenario={scenario} label="Uncertainty results by option" className="text-sm">
            P10, P50 and P90: the present value that 10 %, 50 % and 90 % of the draws stay at or below (sample quantiles by linear
            interpolation, definition 7 of Hyndman and Fan, 1996). Ties for cheapest go to the option listed first.
          </UncertaintyTable>
        </div>
      ) : null}
    </Panel>
  );
}
