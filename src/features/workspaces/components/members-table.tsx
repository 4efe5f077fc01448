import { useState } from 'react';
import type { Role } from '../../../contracts/api/common';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/input';
import { Notice } from '../../../components/ui/notice';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import type { WorkspaceScope } from '../../../lib/workspace-context';
import { useMembers } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMember } from '../api/update-member';

const ROLES: Role[] = ['owner', 'editor', 'viewer'];

/** Members with their roles; owners change roles and remove members (a second click confirms). */
export function MembersTable({ scope, currentUserId }: { scope: WorkspaceScope; currentUserId: string }) {
  const members = useMembers(scope.workspaceId);
  const update = useUpdateMember();
  const remove = useRemoveMember();
  const [confirming, setConfirming] = useState<string | null>(null);
  if (members.isPending) return <LoadingState what="Loading members" />;
  if (members.isError) return <ErrorState error={members.error} retry={() => void members.refetch()} />;
  if (members.data.members.length === 0) return <EmptyState title="No members" />;
  return (
    <div className="overflow-x-auto">
      {update.isError ? <Notice tone="error">{errorMessage(update.error)}</Notice> : null}
      {remove.isError ? <Notice tone="error">{errorMessage(remove.error)}</Notice> : null}
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-line-strong text-left text-ink-soft">
            <th scope="col" className="py-1 font-medium">Name</th>
            <th scope="col" className="font-medium">E-mail</th>
            <th scope="col" className="font-medium">Role</th>
            <th scope="col" className="font-medium">Joined</th>
            <th scope="col"><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {members.data.members.map((m) => (
            <tr key={m.userId} className="border-b border-line">
              <td className="py-1.5">{m.name}{m.userId === currentUserId ? ' (you)' : ''}</td>
              <td>{m.email}</td>
              <td>
                {scope.canManage ? (
                  <Select
                    aria-label={`Role of ${m.name}`}
                    className="w-auto py-0.5"
                    value={m.role}
                    disabled={update.isPending}
                    onChange={(e) => update.mutate({ wid: scope.workspaceId, userId: m.userId, role: e.target.value as Role })}
                  >
                    {ROLES.map((r) => (
                      <option key={r} value={r}>{r}</option>
                    ))}
                  </Select>
                ) : (
                  m.role
                )}
              </td>
              <td>{formatDateTime(m.joinedAt)}</td>
              <td className="text-right">
                {scope.canManage && m.userId !== currentUserId ? (
                  confirming === m.userId ? (
                    <Button size="sm" tone="danger" busy={remove.isPending} onClick={() => remove.mutate({ wid: scope.workspaceId, userId: m.userId }, { onSettled: () => setConfirming(null) })}>
                      Remove {m.name} for good
                    </Button>
                  ) : (
                    <Button size="sm" tone="quiet" onClick={() => setConfirming(m.userId)}>Remove</Button>
                  )
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
