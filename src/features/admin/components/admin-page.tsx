import { NavLink } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { cn } from '../../../lib/cn';
import { AdminAccess } from './admin-access';
import { AccountsSection } from './accounts-section';
import { CaughtMailSection } from './caught-mail-section';

/** The site-admin pages. */
export type AdminSection = 'mail' | 'accounts';

const tab = ({ isActive }: { isActive: boolean }) =>
  cn('rounded-t-md border-b-2 px-3 py-1.5 font-medium', isActive ? 'border-spruce-700 text-ink' : 'border-transparent text-ink-soft hover:text-ink');

/** Site administration: the caught mail and the accounts, behind a site-admin check. */
export function AdminPage({ section }: { section: AdminSection }) {
  return (
    <AdminAccess>
      <div className="mb-4 flex flex-wrap items-end justify-between gap-2 border-b border-line">
        <div className="pb-1">
          <p className="text-xs uppercase tracking-wide text-ink-soft">Site administration</p>
          <h1 className="text-lg font-semibold">{section === 'mail' ? 'Caught mail' : 'Accounts'}</h1>
        </div>
        <nav aria-label="Site administration" className="flex gap-1">
          <NavLink to={paths.admin.to('mail')} className={tab}>Caught mail</NavLink>
          <NavLink to={paths.admin.to('accounts')} className={tab}>Accounts</NavLink>
        </nav>
      </div>
      {section === 'mail' ? <CaughtMailSection /> : <AccountsSection />}
    </AdminAccess>
  );
}
