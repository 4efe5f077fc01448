import { Link, Navigate, useLocation, useNavigate } from 'react-router-dom';
import { Panel } from '../../components/ui/panel';
import { EmptyState, ErrorState, LoadingState } from '../../components/ui/states';
import { CreateWorkspaceForm } from '../../features/workspaces/components/create-workspace-form';
import { useMe } from '../../lib/auth';
import { paths } from '../paths';

/** All of the person's workspaces, and a form to start a new one. */
export default function Workspaces() {
  const me = useMe();
  const navigate = useNavigate();
  const location = useLocation();
  if (me.isPending) return <LoadingState what="Loading your workspaces" />;
  if (me.isError) return <ErrorState error={me.error} retry={() => void me.refetch()} />;
  if (!me.data.user) return <Navigate replace to={paths.signIn.to(location.pathname)} />;
  const list = me.data.memberships;
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <Panel title="Your workspaces">
        {list.length === 0 ? (
          <EmptyState title="You are not in any workspace yet">Create one here, or open an invitation link someone sent you.</EmptyState>
        ) : (
          <ul className="divide-y divide-line">
            {list.map((m) => (
              <li key={m.workspaceId} className="flex items-center justify-between py-2">
                <Link className="font-medium text-spruce-700 underline" to={paths.scenarios.to(m.workspaceId)}>{m.name}</Link>
                <span className="text-sm text-ink-soft">{m.role} · {m.currency} · {m.unitSystem === 'si' ? 'SI units' : 'imperial units'}</span>
              </li>
            ))}
          </ul>
        )}
      </Panel>
      <Panel title="Start a new workspace">
        <p className="mb-3 text-sm text-ink-soft">One per farm, client or publication. You will be its owner.</p>
        <CreateWorkspaceForm onCreated={(wid) => void navigate(paths.scenarios.to(wid))} />
      </Panel>
    </div>
  );
}
