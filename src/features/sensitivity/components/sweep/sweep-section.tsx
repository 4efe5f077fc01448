import { lazy, Suspense, useMemo } from 'react';
import type { Scenario } from '../../../../contracts/scenario';
import { SWEEP_MAX_STEPS } from '../../../../contracts/sensitivity';
import { Panel } from '../../../../components/ui/panel';
import { LoadingState } from '../../../../components/ui/states';
import { useAnalysisRun } from '../../hooks/use-analysis-run';
import type { SweepDraft } from '../../lib/analysis-settings';
import { sweepErrors, sweepFromDraft } from '../../lib/draft-settings';
import type { OptionStyle } from '../../lib/option-colours';
import { DraftNumber, OptionSelect } from '../draft-field';
import { OptionLegend } from '../option-legend';
import { RunControls } from '../run-controls';
import { winShares } from './sweep-csv';
import { SweepTable } from './sweep-table';

const SweepHeatMap = lazy(() => import('./sweep-heat-map'));

/** Two-way sweep: electricity price × an efficacy multiplier on one option, coloured by the cheapest option. */
export function SweepSection({ scenario, draft, onDraft, styles }: {
  scenario: Scenario;
  draft: SweepDraft;
  onDraft: (d: SweepDraft) => void;
  styles: OptionStyle[];
}) {
  const run = useAnalysisRun('sweep');
  const errors = useMemo(() => sweepErrors(scenario, draft), [scenario, draft]);
  const set = (patch: Partial<SweepDraft>) => onDraft({ ...draft, ...patch });
  const options = scenario.options.map((o) => ({ id: o.id, label: o.label }));
  const result = run.result;
  const shares = useMemo(() => (result ? winShares(result) : undefined), [result]);
  const c = scenario.currency;
  return (
    <Panel title="Which option is cheapest at each price and efficacy">
      <p className="mb-3 max-w-3xl text-sm text-ink-soft">
        Every cell prices all options over the whole horizon at one year-1 electricity price and with one option’s photon efficacy
        multiplied (fewer fixtures give the same light), with the same cash flows as the yearly ledger. Up to {SWEEP_MAX_STEPS} × {SWEEP_MAX_STEPS} cells.
      </p>
      <div className="grid max-w-4xl gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <OptionSelect className="sm:col-span-2" label="Option whose efficacy is multiplied" value={draft.vary} onChange={(vary) => set({ vary })} options={options} error={errors.vary} />
        <OptionSelect className="sm:col-span-2" label="Present value shown when pointing at a cell" value={draft.showValueOf} onChange={(showValueOf) => set({ showValueOf })} options={options} />
        <DraftNumber label="Lowest price" unit={`${c}/kWh`} value={draft.tariffLo} onChange={(tariffLo) => set({ tariffLo })} error={errors['tariff.lo']} />
        <DraftNumber label="Highest price" unit={`${c}/kWh`} value={draft.tariffHi} onChange={(tariffHi) => set({ tariffHi })} error={errors['tariff.hi']} />
        <DraftNumber label="Price steps" value={draft.tariffN} onChange={(tariffN) => set({ tariffN })} error={errors['tariff.n']} width="w-28" />
        <span />
        <DraftNumber label="Lowest multiplier" unit="×" value={draft.factorLo} onChange={(factorLo) => set({ factorLo })} error={errors['efficacy.lo']} />
        <DraftNumber label="Highest multiplier" unit="×" value={draft.factorHi} onChange={(factorHi) => set({ factorHi })} error={errors['efficacy.hi']} />
        <DraftNumber label="Multiplier steps" value={draft.factorN} onChange={(factorN) => set({ factorN })} error={errors['efficacy.n']} width="w-28" />
      </div>
      <RunControls run={run} label="Run the sweep" unit="price rows" blocked={Object.keys(errors).length > 0} onRun={() => run.run(scenario, sweepFromDraft(draft))} />
      {result ? (
        <div className="mt-2 space-y-2" data-testid="sweep-result">
          <OptionLegend scenario={scenario} styles={styles} shares={shares} shareText="of the cells" />
          <Suspense fallback={<LoadingState what="Drawing the grid" />}>
            <SweepHeatMap result={result} scenario={scenario} styles={styles} showValueOf={draft.showValueOf} />
          </Suspense>
          <SweepTable result={result} scenario={scenario} showValueOf={draft.showValueOf} />
        </div>
      ) : null}
    </Panel>
  );
}
