import type { ReactNode } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { useMe } from '../../../lib/auth';

/** What a person who is not a site admin sees; the API refuses them on its own (403). */
export function OnlySiteAdmins() {
  return (
    <div className="rounded-lg border border-line bg-panel px-5 py-8">
      <h1 className="text-xl font-semibold">Only site admins can see this page</h1>
      <p className="mt-2 text-ink-soft">Your account does not have site-admin rights. Another site admin of this installation can give them.</p>
      <p className="mt-3">
        <Link className="text-spruce-700 underline underline-offset-2" to={paths.workspaces.to()}>
          Go to your workspaces
        </Link>
      </p>
    </div>
  );
}

/**
 * Shows the page only to a signed-in site admin. This spares others a page of errors; the server's
 * own check (siteAdminOnly) is what keeps the data from them.
 */
export function AdminAccess({ children }: { children: ReactNode }) {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <LoadingState what="Checking who is signed in" />;
  if (me.isError) return <ErrorState error={me.error} retry={() => void me.refetch()} />;
  if (!me.data.user) {
    return (
      <div className="rounded-lg border border-line bg-panel px-5 py-8">
        <h1 className="text-xl font-semibold">Only site admins can see this page</h1>
        <p className="mt-2">
          <Link className="text-spruce-700 underline underline-offset-2" to={paths.signIn.to(location.pathname + location.search)}>
            Sign in as a site admin
          </Link>
        </p>
      </div>
    );
  }
  if (!me.data.user.isSiteAdmin) return <OnlySiteAdmins />;
  return children;
}
