import type { MembershipSummary } from '../../../contracts/api/account';
import { Select } from '../../../components/ui/input';

const ALL = '__all__';

/** A labelled select of the person's workspaces; choosing one opens it. */
export function WorkspaceSwitcher({ memberships, current, onOpen, onAll }: {
  memberships: MembershipSummary[];
  current: string | undefined;
  onOpen: (workspaceId: string) => void;
  onAll: () => void;
}) {
  return (
    <label className="flex items-center gap-1.5 text-sm">
      <span className="text-spruce-100">Workspace</span>
      <Select
        className="w-auto max-w-[16rem] border-spruce-600 py-0.5"
        value={current ?? ''}
        onChange={(e) => (e.target.value === ALL ? onAll() : onOpen(e.target.value))}
      >
        {current === undefined ? <option value="">Choose…</option> : null}
        {memberships.map((m) => (
          <option key={m.workspaceId} value={m.workspaceId}>
            {m.name} ({m.role})
          </option>
        ))}
        <option value={ALL}>All workspaces…</option>
      </Select>
    </label>
  );
}
