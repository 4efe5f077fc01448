import { Link, useNavigate, useParams } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { Notice } from '../../components/ui/notice';
import { Panel } from '../../components/ui/panel';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { useAcceptInvitation } from '../../features/workspaces/api/accept-invitation';
import { useInvitation } from '../../features/workspaces/api/get-invitation';
import { errorMessage } from '../../lib/api-client';
import { useMe } from '../../lib/auth';
import { formatDateTime } from '../../lib/format';
import { paths } from '../paths';

/** An invitation link: what it offers, and a button to join (after signing in as the invited address). */
export default function Invitation() {
  const { token = '' } = useParams();
  const invitation = useInvitation(token);
  const me = useMe();
  const accept = useAcceptInvitation();
  const navigate = useNavigate();
  const here = paths.invitation.to(token);
  if (invitation.isPending) return <LoadingState what="Opening the invitation" />;
  if (invitation.isError) return <ErrorState title="This invitation cannot be opened" error={invitation.error} />;
  const i = invitation.data;
  return (
    <div className="mx-auto max-w-lg">
      <Panel title={`Join ${i.workspaceName}`}>
        <p>
          {i.invitedByName} invited <strong>{i.email}</strong> to join as {i.role === 'owner' ? 'an owner' : `a${i.role === 'editor' ? 'n' : ''} ${i.role}`}. The link works until{' '}
          {formatDateTime(i.expiresAt)}.
        </p>
        {i.status !== 'pending' ? <Notice tone="caution" className="mt-3">This invitation is {i.status}.</Notice> : null}
        {accept.isError ? <Notice tone="error" className="mt-3">{errorMessage(accept.error)}</Notice> : null}
        <div className="mt-4">
          {!me.data?.user ? (
            <p>
              <Link className="text-spruce-700 underline" to={paths.signIn.to(here)}>Sign in</Link> or{' '}
              <Link className="text-spruce-700 underline" to={paths.signUp.to(here)}>create an account</Link> as {i.email} to accept.
            </p>
          ) : i.status === 'pending' ? (
            <Button tone="primary" busy={accept.isPending} onClick={() => accept.mutate(token, { onSuccess: (r) => void navigate(paths.scenarios.to(r.membership.workspaceId)) })}>
              Accept and open the workspace
            </Button>
          ) : null}
        </div>
      </Panel>
    </div>
  );
}
