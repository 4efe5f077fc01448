import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Input } from '../../../components/ui/input';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { isApiError } from '../../../lib/api-client';
import { useMe } from '../../../lib/auth';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { ACCOUNTS_PAGE_SIZE, useAdminUsers } from '../api/get-admin-users';
import { AccountRow } from './account-row';
import { OnlySiteAdmins } from './admin-access';

/** Every account on the installation, searchable by name or e-mail, with what site admins may change. */
export function AccountsSection() {
  const [typed, setTyped] = useState('');
  const [page, setPage] = useState(1);
  const q = useDebouncedValue(typed.trim(), 300);
  const users = useAdminUsers({ q, page });
  const meId = useMe().data?.user?.id ?? '';
  const pages = users.data ? Math.max(1, Math.ceil(users.data.total / ACCOUNTS_PAGE_SIZE)) : 1;
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-soft">
        A disabled account cannot sign in, and its open sessions end at once. Accounts cannot be deleted here, and
        passwords cannot be set for others: the person asks for a sign-in link on the sign-in page instead.
      </p>
      <Field label="Search by name or e-mail" className="max-w-sm">
        <Input
          type="search"
          value={typed}
          onChange={(e) => {
            setTyped(e.target.value);
            setPage(1);
          }}
        />
      </Field>
      {users.isPending ? (
        <LoadingState what="Loading the accounts" />
      ) : users.isError ? (
        isApiError(users.error) && users.error.status === 403 ? <OnlySiteAdmins /> : <ErrorState error={users.error} retry={() => void users.refetch()} />
      ) : users.data.items.length === 0 ? (
        <EmptyState title={q ? `No account's name or e-mail contains “${q}”` : 'No accounts yet'} />
      ) : (
        <>
          <div className="overflow-x-auto rounded-lg border border-line bg-panel">
            <table className="w-full border-collapse text-sm" aria-label="Accounts" aria-busy={users.isPlaceholderData || undefined}>
              <thead>
                <tr className="border-b border-line-strong text-left text-ink-soft">
                  <th scope="col" className="px-3 py-1.5 font-medium">Name</th>
                  <th scope="col" className="px-3 py-1.5 font-medium">E-mail</th>
                  <th scope="col" className="px-3 py-1.5 font-medium">Created</th>
                  <th scope="col" className="px-3 py-1.5 text-right font-medium">Workspaces</th>
                  <th scope="col" className="px-3 py-1.5 font-medium">Site admin</th>
                  <th scope="col" className="px-3 py-1.5 font-medium">Status</th>
                  <th scope="col" className="px-3 py-1.5 font-medium">Actions</th>
                </tr>
              </thead>
              <tbody>
                {users.data.items.map((u) => (
                  <AccountRow key={u.id} user={u} isYou={u.id === meId} />
                ))}
              </tbody>
            </table>
          </div>
          <nav aria-label="Pages of accounts" className="flex items-center gap-3 text-sm">
            <Button size="sm" disabled={page <= 1} onClick={() => setPage(page - 1)}>Previous page</Button>
            <span>
              Page {users.data.page} of {pages} · {users.data.total === 1 ? '1 account' : `${users.data.total} accounts`}
            </span>
            <Button size="sm" disabled={page >= pages} onClick={() => setPage(page + 1)}>Next page</Button>
          </nav>
        </>
      )}
    </div>
  );
}
