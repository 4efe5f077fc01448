import { lazy, Suspense, useMemo } from 'react';
import type { Scenario } from '../../../../contracts/scenario';
import { Field } from '../../../../components/ui/field';
import { Select } from '../../../../components/ui/input';
import { Notice } from '../../../../components/ui/notice';
import { Panel } from '../../../../components/ui/panel';
import { LoadingState } from '../../../../components/ui/states';
import { measureValue, rankSwings } from '../../../../engine/sensitivity/swings';
import { formatMoney } from '../../../../lib/format';
import { useAnalysisRun } from '../../hooks/use-analysis-run';
import type { SwingsDraft } from '../../lib/analysis-settings';
import { measureOf, swingsErrors, swingsFromDraft } from '../../lib/draft-settings';
import { inputLabel, shortName } from '../../lib/labels';
import { DraftNumber, OptionSelect } from '../draft-field';
import { RunControls } from '../run-controls';
import { SwingsTable } from './swings-table';

const SwingsChart = lazy(() => import('./swings-chart'));
const CHART_ROWS = 12;

/** One-at-a-time swings: every numeric input moved down and up by the same share, ranked by how far the result moves. */
export function SwingsSection({ scenario, draft, onDraft }: { scenario: Scenario; draft: SwingsDraft; onDraft: (d: SwingsDraft) => void }) {
  const run = useAnalysisRun('swings');
  const errors = useMemo(() => swingsErrors(scenario, draft), [scenario, draft]);
  const set = (patch: Partial<SwingsDraft>) => onDraft({ ...draft, ...patch });
  const options = scenario.options.map((o) => ({ id: o.id, label: o.label }));
  const result = run.result;
  const measureOk = !errors['measure.a'] && !errors['measure.b'] && !errors['measure.id'];
  // The ranking follows the chosen measure at once: every swing already holds every option's present value.
  const view = useMemo(() => {
    if (!result) return null;
    const m = measureOk ? measureOf(draft) : result.measure;
    return { measure: m, rows: rankSwings(result.rows, result.ids, m), base: measureValue(result.basePresentValue, result.ids, m) };
  }, [result, draft, measureOk]);
  const measureText = view
    ? view.measure.kind === 'option'
      ? `the present value of ${shortName(scenario, view.measure.id)}`
      : `the gap in present value, ${shortName(scenario, view.measure.a)} minus ${shortName(scenario, view.measure.b)}`
    : '';
  const bars = view?.rows.slice(0, CHART_ROWS).map((r) => ({ name: inputLabel(scenario, r.path), lowered: r.measureLow - view.base, raised: r.measureHigh - view.base })) ?? [];
  return (
    <Panel title="Which inputs move the result most">
      <p className="mb-3 max-w-3xl text-sm text-ink-soft">
        Each number that enters the costs is moved down and up by the same share while every other input stays as entered; a value that
        would leave its allowed range is held at its limit.
      </p>
      <div className="flex max-w-5xl flex-wrap items-start gap-3">
        <DraftNumber label="Move each input by" unit="%" value={draft.pct} onChange={(pct) => set({ pct })} error={errors.pct} width="w-36" />
        <Field label="Rank by" className="w-64">
          <Select value={draft.measure} onChange={(e) => set({ measure: e.target.value === 'gap' ? 'gap' : 'option' })}>
            <option value="option">Present value of one option</option>
            <option value="gap">Gap between two options</option>
          </Select>
        </Field>
        <OptionSelect className="w-80" label={draft.measure === 'gap' ? 'First option' : 'Option'} value={draft.a} onChange={(a) => set({ a })} options={options} error={errors['measure.a'] ?? errors['measure.id']} />
        {draft.measure === 'gap' ? <OptionSelect className="w-80" label="Minus option" value={draft.b} onChange={(b) => set({ b })} options={options} error={errors['measure.b']} /> : null}
      </div>
      <RunControls run={run} label="Run the swings" unit="inputs" blocked={Object.keys(errors).length > 0} onRun={() => run.run(scenario, swingsFromDraft(draft))} />
      {result && view ? (
        <div className="mt-2 space-y-3" data-testid="swings-result">
          <p className="text-sm">
            Ranked by {measureText}: <strong className="figure">{formatMoney(String(view.base), scenario.currency)}</strong> as entered. Each input moved by{' '}
            {result.pct} %. The chart shows the {Math.min(CHART_ROWS, view.rows.length)} largest of {view.rows.length}; the table has all.
          </p>
          <Suspense fallback={<LoadingState what="Drawing the chart" />}>
            <SwingsChart bars={bars} pct={result.pct} currency={scenario.currency} />
          </Suspense>
          <SwingsTable rows={view.rows} scenario={scenario} baseMeasure={view.base} />
          {result.invalid.length > 0 ? (
            <Notice tone="caution" title="Some inputs could not be moved this far">
              <ul className="list-disc pl-5">
                {result.invalid.map((x) => <li key={x.path}>{inputLabel(scenario, x.path)}: {x.problems.map((p) => `${p.path} ${p.message}`).join('; ')}</li>)}
              </ul>
            </Notice>
          ) : null}
        </div>
      ) : null}
    </Panel>
  );
}
