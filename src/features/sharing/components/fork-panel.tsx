import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Select } from '../../../components/ui/input';
import { errorMessage } from '../../../lib/api-client';
import { useMe } from '../../../lib/auth';
import { useForkSnapshot } from '../api/fork-snapshot';

/** Copies the snapshot into one of the reader's workspaces where they edit, then opens the copy. */
export function ForkPanel({ snapshotId }: { snapshotId: string }) {
  const me = useMe();
  const navigate = useNavigate();
  const fork = useForkSnapshot();
  const editable = (me.data?.memberships ?? []).filter((w) => w.role !== 'viewer');
  const [chosen, setChosen] = useState<string | undefined>();
  const wid = chosen ?? editable[0]?.workspaceId;
  if (me.isPending) return null;
  if (!me.data?.user) {
    return (
      <p className="text-sm">
        <Link className="text-spruce-700 underline" to={paths.signIn.to(paths.sharedSnapshot.to(snapshotId))}>Sign in</Link> to copy this comparison into a
        workspace of your own and change it there.
      </p>
    );
  }
  if (!wid) return <p className="text-sm text-ink-soft">You edit no workspace yet; create one to copy this comparison into it.</p>;
  const submit = () =>
    fork.mutate({ id: snapshotId, body: { workspaceId: wid } }, { onSuccess: (r) => void navigate(paths.scenario.to(r.scenario.workspaceId, r.scenario.id)) });
  return (
    <div className="flex flex-wrap items-end gap-2">
      <Field label="Copy into workspace" className="min-w-64">
        <Select value={wid} onChange={(e) => setChosen(e.target.value)}>
          {editable.map((w) => (
            <option key={w.workspaceId} value={w.workspaceId}>{w.name}</option>
          ))}
        </Select>
      </Field>
      <Button tone="primary" busy={fork.isPending} onClick={submit}>Make my own copy</Button>
      {fork.isError ? <p role="alert" className="w-full text-sm text-danger-700">{errorMessage(fork.error)}</p> : null}
    </div>
  );
}
