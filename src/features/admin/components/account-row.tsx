import { useState } from 'react';
import type { AdminUser, UpdateAdminUserRequest } from '../../../contracts/api/admin';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { formatDateTime } from '../../../lib/format';
import { useUpdateAdminUser } from '../api/update-admin-user';
import { refusalText } from '../lib/refusal-text';
import { RenameAccount } from './rename-account';

type Confirming = 'disable' | 'grant' | 'revoke';

const confirmLabel = (what: Confirming, name: string) =>
  ({
    disable: `Disable ${name} and end their sessions`,
    grant: `Give ${name} site-admin rights`,
    revoke: `Take site-admin rights from ${name}`,
  })[what];

/**
 * One account with its actions. Disabling and changing site-admin rights ask for a second click;
 * the server's answer to a refused change is shown beside the buttons.
 */
export function AccountRow({ user, isYou }: { user: AdminUser; isYou: boolean }) {
  const update = useUpdateAdminUser();
  const [confirming, setConfirming] = useState<Confirming | null>(null);
  const [renaming, setRenaming] = useState(false);
  const send = (change: UpdateAdminUserRequest, after?: () => void) => {
    update.reset();
    update.mutate({ uid: user.id, ...change }, { onSuccess: after, onSettled: () => setConfirming(null) });
  };
  const start = (what: Confirming) => {
    update.reset();
    setConfirming(what);
  };
  return (
    <tr className="border-b border-line align-top">
      <th scope="row" className="px-3 py-1.5 text-left font-medium">
        {user.name}
        {isYou ? <span className="font-normal text-ink-soft"> (you)</span> : null}
      </th>
      <td className="break-all px-3 py-1.5">{user.email}</td>
      <td className="whitespace-nowrap px-3 py-1.5 text-ink-soft">{formatDateTime(user.createdAt)}</td>
      <td className="figure px-3 py-1.5 text-right">{user.workspaceCount}</td>
      <td className="px-3 py-1.5">{user.isSiteAdmin ? <Badge tone="spruce">site admin</Badge> : <span className="text-ink-soft">no</span>}</td>
      <td className="px-3 py-1.5">{user.disabled ? <Badge tone="danger">disabled</Badge> : <Badge tone="ok">active</Badge>}</td>
      <td className="px-3 py-1.5">
        {renaming ? (
          <RenameAccount
            user={user}
            busy={update.isPending}
            error={update.isError ? refusalText(update.error) : undefined}
            onSave={(name) => send({ name }, () => setRenaming(false))}
            onCancel={() => {
              update.reset();
              setRenaming(false);
            }}
          />
        ) : confirming ? (
          <div className="flex flex-wrap gap-1.5">
            <Button size="sm" tone="danger" busy={update.isPending} onClick={() => send(confirming === 'disable' ? { disabled: true } : { isSiteAdmin: confirming === 'grant' })}>
              {confirmLabel(confirming, user.name)}
            </Button>
            <Button size="sm" tone="quiet" onClick={() => setConfirming(null)}>Keep as it is</Button>
          </div>
        ) : (
          <div className="flex flex-wrap gap-1.5">
            <Button size="sm" tone="quiet" aria-label={`Rename ${user.name}`} onClick={() => { update.reset(); setRenaming(true); }}>Rename</Button>
            {user.disabled ? (
              <Button size="sm" tone="quiet" busy={update.isPending} aria-label={`Enable ${user.name}`} onClick={() => send({ disabled: false })}>Enable</Button>
            ) : isYou ? null : (
              <Button size="sm" tone="quiet" aria-label={`Disable ${user.name}`} onClick={() => start('disable')}>Disable</Button>
            )}
            {isYou ? null : user.isSiteAdmin ? (
              <Button size="sm" tone="quiet" aria-label={`Take site-admin rights from ${user.name}`} onClick={() => start('revoke')}>Remove site admin</Button>
            ) : (
              <Button size="sm" tone="quiet" aria-label={`Make ${user.name} a site admin`} onClick={() => start('grant')}>Make site admin</Button>
            )}
          </div>
        )}
        {update.isError && !renaming ? (
          <p role="alert" className="mt-1 max-w-xs text-sm text-danger-700">{refusalText(update.error)}</p>
        ) : null}
        {isYou && !renaming ? <p className="mt-1 max-w-xs text-xs text-ink-soft">Another site admin can disable your account or take your rights.</p> : null}
      </td>
    </tr>
  );
}
