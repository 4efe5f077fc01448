import { useEffect, useMemo } from 'react';
import type { Scenario } from '../../../contracts/scenario';
import { Button } from '../../../components/ui/button';
import { LoadingState } from '../../../components/ui/states';
import { useAnalysisSettings } from '../hooks/use-analysis-settings';
import type { SaveStatus } from '../hooks/use-analysis-settings';
import { defaultAnalysisSettings, fitToScenario } from '../lib/analysis-settings';
import type { AnalysisSettings } from '../lib/analysis-settings';
import { optionStyles } from '../lib/option-colours';
import { BreakevenSection } from './breakeven/breakeven-section';
import { SwingsSection } from './swings/swings-section';
import { SweepSection } from './sweep/sweep-section';
import { UncertaintySection } from './uncertainty/uncertainty-section';

/**
 * Sensitivity and uncertainty of one scenario: the two-way sweep, one-at-a-time swings, break-even
 * figures for a pair of options, and a seeded uncertainty run. Each runs in the background and can
 * be cancelled; the settings, seed included, are kept per scenario.
 */
export function SensitivityPanel({ workspaceId, scenarioId, scenario }: { workspaceId: string; scenarioId: string; scenario: Scenario }) {
  const store = useAnalysisSettings(workspaceId, scenarioId);
  const defaults = useMemo(() => defaultAnalysisSettings(scenario), [scenario]);
  const settings = useMemo(() => fitToScenario(store.saved ?? defaults, scenario, defaults), [store.saved, scenario, defaults]);
  const styles = useMemo(() => optionStyles(scenario), [scenario]);
  const { ready, saved, save } = store;
  // Keep the first seed shown, so that a reload gives the same uncertainty run.
  useEffect(() => {
    if (ready && !saved) save(defaults);
  }, [ready, saved, save, defaults]);
  // Until the kept settings arrive, suggested ones (another seed) would show and then change under the reader.
  if (store.loading) return <LoadingState what="Loading the settings kept with this scenario" />;
  const update = <K extends keyof AnalysisSettings>(key: K, value: AnalysisSettings[K]) => save({ ...settings, [key]: value });

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-2 text-sm text-ink-soft">
        <p className="max-w-3xl">
          These runs use the scenario as last saved.{' '}
          {store.shared
            ? 'The settings below, the uncertainty seed included, are kept with the scenario, so everyone who opens it gets the same runs.'
            : 'The settings below are kept with the scenario by its editors; your changes last for this visit.'}
        </p>
        <div className="flex items-center gap-3">
          <SaveStatusText status={store.status} />
          <Button size="sm" tone="quiet" onClick={store.clear}>Start again from the suggested settings</Button>
        </div>
      </div>
      <SweepSection scenario={scenario} styles={styles} draft={settings.sweep} onDraft={(d) => update('sweep', d)} />
      <SwingsSection scenario={scenario} draft={settings.swings} onDraft={(d) => update('swings', d)} />
      <BreakevenSection scenario={scenario} draft={settings.breakeven} onDraft={(d) => update('breakeven', d)} />
      <UncertaintySection scenario={scenario} styles={styles} draft={settings.uncertainty} onDraft={(d) => update('uncertainty', d)} />
    </div>
  );
}

const STATUS_TEXT: Record<Exclude<SaveStatus, null>, string> = {
  saving: 'Saving the settings…',
  saved: 'Settings kept with the scenario.',
  failed: 'The settings could not be saved; your changes last until you leave this page.',
};

/** Says politely (to screen readers too) whether the last change of the settings reached the server. */
function SaveStatusText({ status }: { status: SaveStatus }) {
  return (
    <span role="status" aria-live="polite" className={status === 'failed' ? 'text-danger' : 'text-ink-soft'}>
      {status ? STATUS_TEXT[status] : ''}
    </span>
  );
}
