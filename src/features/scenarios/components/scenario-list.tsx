import { useEffect, useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { Button } from '../../../components/ui/button';
import { Input } from '../../../components/ui/input';
import { Notice } from '../../../components/ui/notice';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import type { WorkspaceScope } from '../../../lib/workspace-context';
import { useDeleteScenario } from '../api/delete-scenario';
import { useDuplicateScenario } from '../api/duplicate-scenario';
import { useScenarios } from '../api/get-scenarios';

const PAGE_SIZE = 20;

/** Search and page through the workspace's scenarios; editors duplicate and delete them. */
export function ScenarioList({ scope, q, page, onQuery, newButton }: {
  scope: WorkspaceScope;
  q: string;
  page: number;
  onQuery: (next: { q: string; page: number }) => void;
  newButton?: React.ReactNode;
}) {
  const [typed, setTyped] = useState(q);
  const settled = useDebouncedValue(typed, 300);
  useEffect(() => {
    if (settled !== q) onQuery({ q: settled, page: 1 });
  }, [settled, q, onQuery]);
  const list = useScenarios(scope.workspaceId, { q: q || undefined, page, pageSize: PAGE_SIZE });
  const duplicate = useDuplicateScenario();
  const remove = useDeleteScenario();
  const [confirming, setConfirming] = useState<string | null>(null);
  const pages = list.data ? Math.max(1, Math.ceil(list.data.total / list.data.pageSize)) : 1;

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <label className="flex min-w-[18rem] flex-col gap-0.5 text-sm">
          <span className="font-medium text-ink-soft">Search by title</span>
          <Input type="search" value={typed} onChange={(e) => setTyped(e.target.value)} placeholder="e.g. flower room" />
        </label>
        {newButton}
      </div>
      {duplicate.isError ? <Notice tone="error">{errorMessage(duplicate.error)}</Notice> : null}
      {remove.isError ? <Notice tone="error">{errorMessage(remove.error)}</Notice> : null}
      {list.isPending ? <LoadingState what="Loading scenarios" /> : null}
      {list.isError ? <ErrorState error={list.error} retry={() => void list.refetch()} /> : null}
      {list.data && list.data.items.length === 0 ? (
        <EmptyState title={q ? `No scenario title contains “${q}”` : 'No scenarios yet'}>
          {q ? 'Try fewer words.' : scope.canEdit ? 'Start one with the button above.' : 'An editor of this workspace can start one.'}
        </EmptyState>
      ) : null}
      {list.data && list.data.items.length > 0 ? (
        <div className="overflow-x-auto rounded-lg border border-line bg-panel">
          <table className="w-full border-collapse text-sm">
            <caption className="sr-only">Scenarios, newest change first</caption>
            <thead>
              <tr className="border-b border-line-strong text-left text-ink-soft">
                <th scope="col" className="px-3 py-1.5 font-medium">Title</th>
                <th scope="col" className="px-2 text-right font-medium">Options</th>
                <th scope="col" className="px-2 text-right font-medium">Revision</th>
                <th scope="col" className="px-2 font-medium">Last change</th>
                <th scope="col" className="px-3"><span className="sr-only">Actions</span></th>
              </tr>
            </thead>
            <tbody>
              {list.data.items.map((s) => (
                <tr key={s.id} className="border-b border-line last:border-0">
                  <td className="px-3 py-1.5">
                    <Link className="font-medium text-spruce-700 underline-offset-2 hover:underline" to={paths.scenario.to(scope.workspaceId, s.id)}>{s.title}</Link>
                  </td>
                  <td className="figure px-2 text-right">{s.optionCount}</td>
                  <td className="figure px-2 text-right">{s.revision}</td>
                  <td className="px-2">{formatDateTime(s.updatedAt)} · {s.updatedBy.name}</td>
                  <td className="px-3 text-right whitespace-nowrap">
                    <Link className="mr-2 text-spruce-700 underline" to={paths.scenarioHistory.to(scope.workspaceId, s.id)}>History</Link>
                    {scope.canEdit ? (
                      <>
                        <Button size="sm" tone="quiet" busy={duplicate.isPending && duplicate.variables.sid === s.id} onClick={() => duplicate.mutate({ wid: scope.workspaceId, sid: s.id })}>Duplicate</Button>
                        {!scope.canManage ? null : confirming === s.id ? (
                          <Button size="sm" tone="danger" onClick={() => remove.mutate({ wid: scope.workspaceId, sid: s.id }, { onSettled: () => setConfirming(null) })}>Delete for good</Button>
                        ) : (
                          <Button size="sm" tone="quiet" onClick={() => setConfirming(s.id)}>Delete</Button>
                        )}
                      </>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {list.data && pages > 1 ? (
        <nav aria-label="Pages" className="flex items-center gap-2 text-sm">
          <Button size="sm" disabled={page <= 1} onClick={() => onQuery({ q, page: page - 1 })}>Previous page</Button>
          <span>Page {page} of {pages} · {list.data.total} scenarios</span>
          <Button size="sm" disabled={page >= pages} onClick={() => onQuery({ q, page: page + 1 })}>Next page</Button>
        </nav>
      ) : null}
    </div>
  );
}
