import { useMemo } from 'react';
import type { Scenario } from '../../../../contracts/scenario';
import { Panel } from '../../../../components/ui/panel';
import { dec } from '../../../../engine/money';
import { useAnalysisRun } from '../../hooks/use-analysis-run';
import type { BreakevenDraft } from '../../lib/analysis-settings';
import { breakevenErrors, breakevenFromDraft } from '../../lib/draft-settings';
import { OptionSelect } from '../draft-field';
import { RunControls } from '../run-controls';
import { EfficacySentence, PriceSentences } from './breakeven-sentences';

/** Where two options cost the same: the break-even electricity price and the break-even efficacy multipliers. */
export function BreakevenSection({ scenario, draft, onDraft }: { scenario: Scenario; draft: BreakevenDraft; onDraft: (d: BreakevenDraft) => void }) {
  const run = useAnalysisRun('breakeven');
  const errors = useMemo(() => breakevenErrors(draft), [draft]);
  const options = scenario.options.map((o) => ({ id: o.id, label: o.label }));
  const r = run.result;
  return (
    <Panel title="Where two options cost the same">
      <div className="grid max-w-4xl gap-3 sm:grid-cols-2">
        <OptionSelect label="One option" value={draft.a} onChange={(a) => onDraft({ ...draft, a })} options={options} error={errors.a} />
        <OptionSelect label="The other option" value={draft.b} onChange={(b) => onDraft({ ...draft, b })} options={options} error={errors.b} />
      </div>
      <RunControls run={run} label="Find the break-even" unit="steps" blocked={Object.keys(errors).length > 0} onRun={() => run.run(scenario, breakevenFromDraft(draft))} />
      {r ? (
        <div className="mt-1 max-w-3xl space-y-2 text-sm" data-testid="breakeven-result">
          <PriceSentences r={r} scenario={scenario} />
          <EfficacySentence e={r.aAgainstB} scenario={scenario} efficacy={r.efficacyA} noDearerNow={!dec(r.gapNow).gt(0)} />
          <EfficacySentence e={r.bAgainstA} scenario={scenario} efficacy={r.efficacyB} noDearerNow={!dec(r.gapNow).lt(0)} />
        </div>
      ) : null}
    </Panel>
  );
}
