import { useMemo } from 'react';
import { Navigate, NavLink, Outlet, useLocation, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { cn } from '../../lib/cn';
import { useMe } from '../../lib/auth';
import { WorkspaceProvider } from '../../lib/workspace-context';
import type { WorkspaceScope } from '../../lib/workspace-context';
import { paths } from '../paths';

const tab = ({ isActive }: { isActive: boolean }) =>
  cn('rounded-t-md border-b-2 px-3 py-1.5 font-medium', isActive ? 'border-spruce-700 text-ink' : 'border-transparent text-ink-soft hover:text-ink');

/** Pages inside one workspace: checks membership, provides the role, currency and units, and shows the workspace's tabs. */
export default function WorkspaceLayout() {
  const { wid = '' } = useParams();
  const me = useMe();
  const location = useLocation();
  const membership = me.data?.memberships.find((m) => m.workspaceId === wid);
  const scope = useMemo<WorkspaceScope | null>(
    () =>
      membership
        ? {
            workspaceId: wid,
            name: membership.name,
            role: membership.role,
            currency: membership.currency,
            unitSystem: membership.unitSystem,
            canEdit: membership.role !== 'viewer',
            canManage: membership.role === 'owner',
          }
        : null,
    [membership, wid],
  );
  if (me.isPending) return <LoadingState what="Checking who is signed in" />;
  if (me.isError) return <ErrorState error={me.error} retry={() => void me.refetch()} />;
  if (!me.data.user) return <Navigate replace to={paths.signIn.to(location.pathname + location.search)} />;
  if (!scope) {
    return <ErrorState title="This workspace is not open to you" error={new Error('You are not a member of this workspace, or it no longer exists.')} />;
  }
  return (
    <WorkspaceProvider value={scope}>
      <div className="mb-4 flex flex-wrap items-end justify-between gap-2 border-b border-line">
        <div className="pb-1">
          <p className="text-xs uppercase tracking-wide text-ink-soft">Workspace</p>
          <p className="text-lg font-semibold">
            {scope.name} <span className="text-sm font-normal text-ink-soft">· you are {scope.role === 'owner' ? 'an owner' : `an ${scope.role}`.replace('an viewer', 'a viewer')}</span>
          </p>
        </div>
        <nav aria-label="Workspace" className="flex gap-1">
          <NavLink to={paths.scenarios.to(wid)} className={tab}>Scenarios</NavLink>
          <NavLink to={paths.fixtures.to(wid)} className={tab}>Fixture library</NavLink>
          <NavLink to={paths.measurements.to(wid)} className={tab}>Measurements</NavLink>
          <NavLink to={paths.settings.to(wid)} className={tab}>Members and settings</NavLink>
        </nav>
      </div>
      <Outlet />
    </WorkspaceProvider>
  );
}
