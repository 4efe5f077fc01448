import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Select, Textarea } from '../../../components/ui/input';
import { Panel } from '../../../components/ui/panel';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/api-client';
import { useCreateSnapshot } from '../api/create-snapshot';
import { useScenarioSnapshots } from '../api/get-scenario-snapshots';
import { EXPIRY_CHOICES, expiryFor } from '../lib/expiry-choices';
import type { ExpiryChoice } from '../lib/expiry-choices';
import { SnapshotLinkRow } from './snapshot-link-row';

/**
 * Publishing a scenario's saved revision as a read-only snapshot, and the links made so far. Opens
 * on request so the editor stays uncluttered.
 */
export function SharePanel({ wid, sid, revision }: { wid: string; sid: string; revision: number }) {
  const [open, setOpen] = useState(false);
  const list = useScenarioSnapshots(wid, sid, open);
  const create = useCreateSnapshot();
  const [notes, setNotes] = useState('');
  const [choice, setChoice] = useState<ExpiryChoice>('never');
  if (!open) {
    return (
      <Button size="sm" onClick={() => setOpen(true)} aria-expanded={false}>
        Share a read-only snapshot…
      </Button>
    );
  }
  const publish = () => create.mutate({ wid, sid, body: { notes, expiresAt: expiryFor(choice) } }, { onSuccess: () => setNotes('') });
  return (
    <Panel title="Share a read-only snapshot" actions={<Button size="sm" tone="quiet" onClick={() => setOpen(false)} aria-expanded>Close</Button>}>
      <p className="text-sm text-ink-soft">
        A snapshot freezes revision {revision} as saved (unsaved edits are not included). Anyone with its link can read it, check that its
        figures reproduce, and download it, without an account.
      </p>
      <div className="mt-2 grid gap-2 md:grid-cols-[1fr_14rem]">
        <Field label="Notes for readers">
          <Textarea value={notes} rows={3} maxLength={4000} onChange={(e) => setNotes(e.target.value)} />
        </Field>
        <Field label="The link works">
          <Select value={choice} onChange={(e) => setChoice(e.target.value as ExpiryChoice)}>
            {EXPIRY_CHOICES.map((c) => <option key={c.value} value={c.value}>{c.label}</option>)}
          </Select>
        </Field>
      </div>
      <Button className="mt-2" tone="primary" busy={create.isPending} onClick={publish}>Publish snapshot of revision {revision}</Button>
      {create.isError ? <p role="alert" className="mt-1 text-sm text-danger-700">{errorMessage(create.error)}</p> : null}
      <h3 className="mt-4 font-semibold">Links of this scenario</h3>
      {list.isPending ? <LoadingState what="Loading the links" /> : null}
      {list.isError ? <ErrorState error={list.error} retry={() => void list.refetch()} /> : null}
      {list.data ? (
        <>
          {list.data.forkedFrom ? (
            <p className="text-sm">
              This scenario was copied from the shared snapshot{' '}
              <Link className="text-spruce-700 underline" to={paths.sharedSnapshot.to(list.data.forkedFrom.snapshotId)}>{list.data.forkedFrom.snapshotId}</Link>.
            </p>
          ) : null}
          {list.data.snapshots.length ? (
            <ul aria-label="Share links">{list.data.snapshots.map((s) => <SnapshotLinkRow key={s.id} wid={wid} snapshot={s} />)}</ul>
          ) : (
            <p className="text-sm text-ink-soft">No snapshot of this scenario has been published yet.</p>
          )}
        </>
      ) : null}
    </Panel>
  );
}
