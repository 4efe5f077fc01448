import { zodResolver } from '@hookform/resolvers/zod';
import { useCallback, useEffect, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { Path } from 'react-hook-form';
import type { ScenarioRecord } from '../../../../contracts/api/scenarios';
import { scenarioSchema } from '../../../../contracts/scenario';
import type { Scenario, ScenarioInput } from '../../../../contracts/scenario';
import { Notice } from '../../../../components/ui/notice';
import { ApiError, errorMessage } from '../../../../lib/api-client';
import type { WorkspaceScope } from '../../../../lib/workspace-context';
import { useUpdateScenario } from '../../api/update-scenario';
import { threeWayMerge, settle } from '../../merge/three-way-merge';
import { useUndoableForm } from '../../hooks/use-undoable-form';
import { LiveResults } from '../live-results';
import { LeaveGuard } from './leave-guard';
import { ConflictNotice } from './conflict-notice';
import type { MergedSave } from './conflict-notice';
import { CostsSection } from './costs-section';
import { EditorToolbar } from './editor-toolbar';
import { Group, TextField } from './form-kit';
import type { LibraryEntry } from './library-entry';
import { OptionsSection } from './options-section';
import { RoomSection } from './room-section';
import { ScheduleSection } from './schedule-section';

/** `options[0].wallWatts` (API problem path) → `options.0.wallWatts` (form path). */
const formPath = (p: string) => p.replace(/\[(\d+)\]/g, '.$1');
const snapshot = (v: unknown) => JSON.stringify(v);

/**
 * The scenario workbench: every input of the scenario, live results beside them, undo and redo
 * over every edit, and saving as a new revision. Typed input is never thrown away on an error.
 */
export function ScenarioEditor({ record, scope, library, historyHref, onLoadLatest }: {
  record: ScenarioRecord;
  scope: WorkspaceScope;
  library: LibraryEntry[] | undefined;
  historyHref: string;
  onLoadLatest: () => Promise<ScenarioRecord | undefined>;
}) {
  const form = useForm<ScenarioInput, unknown, Scenario>({
    resolver: zodResolver(scenarioSchema),
    mode: 'onChange',
    defaultValues: structuredClone(record.document) as ScenarioInput,
  });
  const history = useUndoableForm(form);
  const currency = useWatch({ control: form.control, name: 'currency' });
  const update = useUpdateScenario();
  const [revision, setRevision] = useState(record.revision);
  const [saved, setSaved] = useState(() => snapshot(form.getValues()));
  const [dirty, setDirty] = useState(false);
  // The stored document of `revision`: the common ancestor when someone else saves in the meantime.
  const [base, setBase] = useState<Scenario>(record.document);
  const [conflict, setConflict] = useState<{ message: string; theirs?: ScenarioRecord } | null>(null);
  const [invalidOnSave, setInvalidOnSave] = useState(false);

  useEffect(
    () => form.subscribe({ formState: { values: true }, callback: ({ values }) => setDirty(snapshot(values) !== saved) }),
    [form, saved],
  );
  useEffect(() => {
    if (!dirty) return undefined;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const fetchLatest = useCallback(async () => {
    try {
      return await onLoadLatest();
    } catch (e) {
      setConflict({ message: `The newest revision could not be loaded: ${errorMessage(e)}` });
      return undefined;
    }
  }, [onLoadLatest]);
  const showConflict = useCallback(
    async (message: string) => {
      setConflict({ message });
      const theirs = await fetchLatest();
      if (theirs) setConflict((c) => c && { ...c, theirs });
    },
    [fetchLatest],
  );

  const save = useCallback(
    (atRevision = revision) => {
      if (!scope.canEdit) return;
      void form.handleSubmit(
        (valid) => {
          setInvalidOnSave(false);
          const sent = snapshot(form.getValues());
          update.mutate(
            { wid: scope.workspaceId, sid: record.id, revision: atRevision, input: { document: valid } },
            {
              onSuccess: (r) => {
                setRevision(r.scenario.revision);
                setBase(r.scenario.document);
                setSaved(sent);
                setDirty(snapshot(form.getValues()) !== sent);
                setConflict(null);
              },
              onError: (e) => {
                if (e instanceof ApiError && e.code === 'conflict') {
                  const current = /\d+/.exec(e.fields.find((f) => f.path === 'revision')?.message ?? '')?.[0];
                  void showConflict(current ? `Revision ${current} was saved while you were editing revision ${atRevision}.` : e.message);
                }
                if (e instanceof ApiError) for (const f of e.fields) if (f.path !== 'revision') form.setError(formPath(f.path.replace(/^document\./, '')) as Path<ScenarioInput>, { message: f.message });
              },
            },
          );
        },
        () => setInvalidOnSave(true),
      )();
    },
    [form, record.id, revision, scope.canEdit, scope.workspaceId, showConflict, update],
  );

  const loadLatest = async () => {
    const latest = await fetchLatest();
    if (!latest) return;
    history.restart(latest.document);
    setRevision(latest.revision);
    setBase(latest.document);
    setSaved(snapshot(form.getValues()));
    setDirty(false);
    setConflict(null);
    update.reset();
  };
  const mergedSaved = ({ record: stored, valuesAtSend }: MergedSave) => {
    const now = form.getValues();
    // Keystrokes typed while the merged save was in flight are newer than anything stored: they win.
    const typedSince = snapshot(now) !== snapshot(valuesAtSend);
    history.restart(typedSince ? (settle(threeWayMerge(valuesAtSend, now, stored.document), {}) as ScenarioInput) : stored.document);
    setRevision(stored.revision);
    setBase(stored.document);
    const storedValues = typedSince ? snapshot(stored.document) : snapshot(form.getValues());
    setSaved(storedValues);
    setDirty(snapshot(form.getValues()) !== storedValues);
    setConflict(null);
    update.reset();
  };

  return (
    <FormProvider {...form}>
      <div className="sticky top-0 z-10 -mx-4 mb-3 border-b border-line bg-paper/95 px-4 py-2 backdrop-blur">
        {scope.canEdit ? (
          <EditorToolbar history={history} onSave={() => save()} saving={update.isPending} dirty={dirty} revision={revision} historyHref={historyHref} />
        ) : (
          <p className="text-sm text-ink-soft">You can read this scenario and its results; only editors and owners change it. Revision {revision}.</p>
        )}
        {scope.canEdit ? <LeaveGuard dirty={dirty} /> : null}
        {update.isError && !conflict ? <Notice tone="error" className="mt-2">Not saved: {errorMessage(update.error)} Your changes are still here.</Notice> : null}
        {invalidOnSave ? <Notice tone="error" className="mt-2">Not saved: some fields need attention; each one says what is wrong beside it.</Notice> : null}
      </div>
      {conflict ? (
        <ConflictNotice
          key={conflict.theirs?.revision ?? 'loading'}
          message={conflict.message}
          base={base}
          theirs={conflict.theirs}
          wid={scope.workspaceId}
          sid={record.id}
          onLoadLatest={() => void loadLatest()}
          onMergedSave={mergedSaved}
          onConflictAgain={(message) => void showConflict(message)}
        />
      ) : null}
      <div className="grid items-start gap-4 lg:grid-cols-[minmax(20rem,27rem)_minmax(0,1fr)]">
        <form noValidate onSubmit={(e) => e.preventDefault()} aria-label="Scenario inputs">
          <fieldset disabled={!scope.canEdit} className="space-y-3">
            <legend className="sr-only">Scenario inputs</legend>
            <Group title="Scenario">
              <TextField name="title" label="Title" />
              <TextField name="currency" label="Currency" hint="ISO 4217 code, e.g. EUR; amounts below are in it." />
            </Group>
            <RoomSection unitSystem={scope.unitSystem} />
            <ScheduleSection canEdit={scope.canEdit} />
            <CostsSection currency={currency} canEdit={scope.canEdit} />
            <OptionsSection currency={currency} canEdit={scope.canEdit} library={library} />
          </fieldset>
        </form>
        <div className="min-w-0">
          <LiveResults form={form as never} unitSystem={scope.unitSystem} />
        </div>
      </div>
    </FormProvider>
  );
}
