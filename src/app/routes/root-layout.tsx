import { Link, Outlet, useMatch, useNavigate } from 'react-router-dom';
import { BrandMark } from '../../components/brand-mark';
import { Button } from '../../components/ui/button';
import { AdminLink } from '../../features/admin/components/admin-link';
import { useSignOut } from '../../features/auth/api/sign-out';
import { WorkspaceSwitcher } from '../../features/workspaces/components/workspace-switcher';
import { useMe } from '../../lib/auth';
import { paths } from '../paths';

/** The frame of every page: the product's name and mark, the workspace switcher, and who is signed in. */
export function RootLayout() {
  const me = useMe();
  const navigate = useNavigate();
  const signOut = useSignOut();
  const match = useMatch({ path: paths.workspace.pattern, end: false });
  const user = me.data?.user ?? null;
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-10 focus:rounded focus:bg-panel focus:px-3 focus:py-1">
        Skip to the content
      </a>
      <header className="bg-spruce-700 text-white">
        <div className="mx-auto flex max-w-[90rem] flex-wrap items-center gap-x-5 gap-y-2 px-4 py-2">
          <Link to={paths.home.to()} className="flex items-center gap-2 text-lg font-semibold tracking-tight text-white">
            <BrandMark size={28} />
            Photon Parity
          </Link>
          {user && me.data ? (
            <WorkspaceSwitcher
              memberships={me.data.memberships}
              current={match?.params.wid}
              onOpen={(wid) => void navigate(paths.scenarios.to(wid))}
              onAll={() => void navigate(paths.workspaces.to())}
            />
          ) : null}
          <div className="ml-auto flex items-center gap-3 text-sm">
            {user ? (
              <>
                <AdminLink />
                <span className="text-spruce-100">
                  Signed in as <span className="font-medium text-white">{user.name}</span>
                </span>
                <Button
                  size="sm"
                  tone="secondary"
                  busy={signOut.isPending}
                  onClick={() => signOut.mutate(undefined, { onSuccess: () => void navigate(paths.home.to()) })}
                >
                  Sign out
                </Button>
              </>
            ) : me.isPending ? null : (
              <>
                <Link className="text-white underline-offset-2 hover:underline" to={paths.signIn.to()}>
                  Sign in
                </Link>
                <Link className="rounded-md bg-gold-400 px-2.5 py-1 font-medium text-ink hover:bg-gold-100" to={paths.signUp.to()}>
                  Create an account
                </Link>
              </>
            )}
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-[90rem] flex-1 px-4 py-5">
        <Outlet />
      </main>
      <footer className="border-t border-line py-3 text-center text-xs text-ink-soft">
        Photon Parity compares lighting options; electrical work belongs to licensed electricians under local codes.
      </footer>
    </div>
  );
}
