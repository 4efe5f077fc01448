import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { CreateInvitationRequest } from '../../../contracts/api/invitations';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Input, Select } from '../../../components/ui/input';
import { Notice } from '../../../components/ui/notice';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import type { WorkspaceScope } from '../../../lib/workspace-context';
import { createInvitationRequestSchema, useCreateInvitation } from '../api/create-invitation';
import { useInvitations } from '../api/get-invitations';
import { useRevokeInvitation } from '../api/revoke-invitation';

/** Owners invite people by e-mail with a role, and see and revoke pending invitations. */
export function InvitationsPanel({ scope }: { scope: WorkspaceScope }) {
  const list = useInvitations(scope.workspaceId, scope.canManage);
  const create = useCreateInvitation();
  const revoke = useRevokeInvitation();
  const form = useForm<CreateInvitationRequest>({ resolver: zodResolver(createInvitationRequestSchema), defaultValues: { email: '', role: 'viewer' } });
  const e = form.formState.errors;
  if (!scope.canManage) return <p className="text-sm text-ink-soft">Only owners invite people and see invitations.</p>;
  const submit = form.handleSubmit((v) =>
    create.mutate(
      { wid: scope.workspaceId, input: v },
      {
        onSuccess: () => form.reset({ email: '', role: v.role }),
        onError: (err) => {
          if (err instanceof ApiError) for (const f of err.fields) if (f.path === 'email') form.setError('email', { message: f.message });
        },
      },
    ),
  );
  return (
    <div className="space-y-4">
      <form noValidate onSubmit={submit} className="flex flex-wrap items-end gap-3">
        <Field label="E-mail address" className="min-w-[16rem] flex-1" error={e.email?.message && `E-mail address ${e.email.message}.`}>
          <Input type="email" {...form.register('email')} />
        </Field>
        <Field label="Role">
          <Select {...form.register('role')}>
            <option value="viewer">viewer (reads)</option>
            <option value="editor">editor (changes data)</option>
            <option value="owner">owner (also manages members)</option>
          </Select>
        </Field>
        <Button type="submit" tone="primary" busy={create.isPending}>Send the invitation</Button>
      </form>
      {create.isError ? <Notice tone="error">{errorMessage(create.error)}</Notice> : null}
      {create.isSuccess ? <Notice tone="ok">Invitation sent to {create.data.invitation.email}; the link works for 7 days.</Notice> : null}
      {list.isPending ? <LoadingState what="Loading invitations" /> : null}
      {list.isError ? <ErrorState error={list.error} retry={() => void list.refetch()} /> : null}
      {list.data && list.data.invitations.length === 0 ? <p className="text-sm text-ink-soft">No invitations yet.</p> : null}
      {list.data && list.data.invitations.length > 0 ? (
        <table className="w-full border-collapse text-sm">
          <thead>
            <tr className="border-b border-line-strong text-left text-ink-soft">
              <th scope="col" className="py-1 font-medium">E-mail</th>
              <th scope="col" className="font-medium">Role</th>
              <th scope="col" className="font-medium">State</th>
              <th scope="col" className="font-medium">Expires</th>
              <th scope="col"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {list.data.invitations.map((i) => (
              <tr key={i.id} className="border-b border-line">
                <td className="py-1.5">{i.email}</td>
                <td>{i.role}</td>
                <td><Badge tone={i.status === 'pending' ? 'gold' : i.status === 'accepted' ? 'ok' : 'neutral'}>{i.status}</Badge></td>
                <td>{formatDateTime(i.expiresAt)}</td>
                <td className="text-right">
                  {i.status === 'pending' ? (
                    <Button size="sm" tone="quiet" busy={revoke.isPending} onClick={() => revoke.mutate({ wid: scope.workspaceId, iid: i.id })}>Revoke</Button>
                  ) : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </div>
  );
}
