import { useMemo, useState } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import type { ScenarioRecord } from '../../../../contracts/api/scenarios';
import { problemLine } from '../../../../contracts/problems';
import { scenarioSchema } from '../../../../contracts/scenario';
import type { Scenario, ScenarioInput } from '../../../../contracts/scenario';
import { Button } from '../../../../components/ui/button';
import { Notice } from '../../../../components/ui/notice';
import { ApiError, errorMessage } from '../../../../lib/api-client';
import { useUpdateScenario } from '../../api/update-scenario';
import { mergedScenario } from '../../merge/merged-scenario';
import { sideChanges } from '../../merge/side-changes';
import { threeWayMerge } from '../../merge/three-way-merge';
import type { Side } from '../../merge/three-way-merge';
import { ChangeList, ClashTable } from './merge-tables';

/** What the editor needs to know after the merged version is stored. */
export interface MergedSave {
  record: ScenarioRecord;
  /** the form values when the merged save was sent, so keystrokes typed while it was in flight are kept */
  valuesAtSend: ScenarioInput;
}

/**
 * Someone saved first. Shows what they changed and what you changed since the revision you started
 * from, lets you choose per field where both changed the same field, and saves the combination on top
 * of their revision. The typed input stays in the form until you pick one of the ways out.
 */
export function ConflictNotice({ message, base, theirs, wid, sid, onLoadLatest, onMergedSave, onConflictAgain }: {
  message: string;
  base: Scenario;
  /** the newest stored revision; undefined while it loads */
  theirs: ScenarioRecord | undefined;
  wid: string;
  sid: string;
  onLoadLatest: () => void;
  onMergedSave: (saved: MergedSave) => void;
  onConflictAgain: (message: string) => void;
}) {
  const form = useFormContext<ScenarioInput>();
  const values = useWatch({ control: form.control });
  const mine = useMemo(() => scenarioSchema.safeParse(values), [values]);
  const merge = useMemo(() => (theirs && mine.success ? threeWayMerge(base, mine.data, theirs.document) : undefined), [base, mine, theirs]);
  const [choices, setChoices] = useState<Record<string, Side>>({});
  const update = useUpdateScenario();
  const open = merge ? merge.clashes.filter((c) => !choices[c.where]).length : 0;
  const checked = merge && open === 0 ? mergedScenario(merge, choices) : undefined;

  const saveMerged = () => {
    if (!theirs || !checked?.ok) return;
    const valuesAtSend = structuredClone(form.getValues());
    update.mutate(
      { wid, sid, revision: theirs.revision, input: { document: checked.value } },
      {
        onSuccess: (r) => onMergedSave({ record: r.scenario, valuesAtSend }),
        onError: (e) => {
          if (e instanceof ApiError && e.code === 'conflict') onConflictAgain(`Revision ${theirs.revision} was not the newest either: someone saved again.`);
        },
      },
    );
  };

  return (
    <section aria-labelledby="conflict-title" className="mb-3 rounded-lg border border-gold-800/40 bg-panel p-3">
      <Notice tone="caution" title={<span id="conflict-title">Someone else saved this scenario while you were editing</span>}>
        <p>{message} Your typed changes are still here and have not been saved.</p>
      </Notice>
      {!theirs ? <p className="mt-2 text-sm">Loading the newest revision to compare it with yours…</p> : null}
      {theirs && !mine.success ? (
        <p className="mt-2 text-sm">Some of your fields need attention (each says what is wrong beside it); once they are valid, the two versions can be combined here.</p>
      ) : null}
      {theirs && merge ? (
        <div className="mt-3 space-y-3">
          <ChangeList title={`What they changed (revision ${theirs.revision})`} changes={sideChanges(base, theirs.document)} empty="nothing." doc={theirs.document} />
          <ChangeList title="What you changed" changes={mine.success ? sideChanges(base, mine.data) : []} empty="nothing." doc={mine.success ? mine.data : base} />
          {merge.clashes.length > 0 ? (
            <ClashTable clashes={merge.clashes} choices={choices} onChoose={(where, side) => setChoices((c) => ({ ...c, [where]: side }))} theirRevision={theirs.revision} doc={theirs.document} />
          ) : (
            <p className="text-sm">None of the fields you changed were changed by them too, so both sets of changes fit together.</p>
          )}
          {checked && !checked.ok ? (
            <Notice tone="error" title="Combined, the two versions break these rules, so it cannot be saved as it is:">
              <ul className="list-disc pl-5">{checked.problems.map((p) => <li key={problemLine(p)}>{problemLine(p)}</li>)}</ul>
            </Notice>
          ) : null}
        </div>
      ) : null}
      {update.isError && !(update.error instanceof ApiError && update.error.code === 'conflict') ? (
        <Notice tone="error" className="mt-2">Not saved: {errorMessage(update.error)} Your changes are still here.</Notice>
      ) : null}
      <div className="mt-3 flex flex-wrap items-center gap-2">
        <Button size="sm" tone="primary" onClick={saveMerged} busy={update.isPending} disabled={!checked?.ok} aria-describedby="merge-state">
          Save the merged version
        </Button>
        <Button size="sm" onClick={onLoadLatest}>Load their version (drops your changes)</Button>
        <span id="merge-state" className="text-sm text-ink-soft">
          {open > 0 ? `Choose a value for ${open === 1 ? 'the 1 field' : `each of the ${open} fields`} you both changed.` : checked?.ok ? `Saves as revision ${(theirs?.revision ?? 0) + 1}, on top of theirs.` : ''}
        </span>
      </div>
    </section>
  );
}
