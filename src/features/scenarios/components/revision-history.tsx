import { useState } from 'react';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Panel } from '../../../components/ui/panel';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import type { WorkspaceScope } from '../../../lib/workspace-context';
import { useRevision } from '../api/get-revision';
import { useRevisions } from '../api/get-revisions';
import { useRestoreRevision } from '../api/restore-revision';
import { RevisionReading } from './revision-reading';

const ACTION_WORDS = { created: 'started', edited: 'changed', restored: 'brought back', duplicated: 'copied' } as const;

/** Revisions newest first with the fields each changed; the chosen one can be read (what it changed, its inputs) or restored. */
export function RevisionHistory({ scope, sid, onRestored }: { scope: WorkspaceScope; sid: string; onRestored: () => void }) {
  const list = useRevisions(scope.workspaceId, sid);
  const [chosen, setChosen] = useState<number | null>(null);
  const detail = useRevision(scope.workspaceId, sid, chosen);
  const restore = useRestoreRevision();
  if (list.isPending) return <LoadingState what="Loading the history" />;
  if (list.isError) return <ErrorState error={list.error} retry={() => void list.refetch()} />;
  if (list.data.revisions.length === 0) return <EmptyState title="No revisions recorded" />;
  const newest = list.data.revisions[0]?.revision;
  return (
    <div className="grid items-start gap-4 lg:grid-cols-2">
      <ol className="divide-y divide-line rounded-lg border border-line bg-panel">
        {list.data.revisions.map((r) => (
          <li key={r.revision} className={`px-3 py-2 ${chosen === r.revision ? 'bg-spruce-50' : ''}`}>
            <div className="flex flex-wrap items-center gap-2">
              <span className="font-semibold">Revision {r.revision}</span>
              <Badge>{ACTION_WORDS[r.action]}{r.fromRevision !== null ? ` from ${r.fromRevision}` : ''}</Badge>
              {r.revision === newest ? <Badge tone="ok">current</Badge> : null}
              <span className="text-sm text-ink-soft">{formatDateTime(r.createdAt)} · {r.createdBy.name}</span>
              <Button size="sm" tone="quiet" className="ml-auto" aria-pressed={chosen === r.revision} onClick={() => setChosen(r.revision)}>Show</Button>
            </div>
            {r.changedPaths.length > 0 ? (
              <p className="mt-0.5 text-sm text-ink-soft">Changed: <span className="figure">{r.changedPaths.slice(0, 8).join(', ')}{r.changedPaths.length > 8 ? ` and ${r.changedPaths.length - 8} more` : ''}</span></p>
            ) : null}
          </li>
        ))}
      </ol>
      <Panel title={chosen === null ? 'Choose a revision' : `Revision ${chosen}`}>
        {chosen === null ? <p className="text-sm text-ink-soft">Choose “Show” beside a revision to read its inputs.</p> : null}
        {detail.isPending && chosen !== null ? <LoadingState what="Loading the revision" /> : null}
        {detail.isError ? <ErrorState error={detail.error} retry={() => void detail.refetch()} /> : null}
        {detail.data ? (
          <>
            <RevisionReading wid={scope.workspaceId} sid={sid} revision={detail.data.revision.revision} document={detail.data.revision.document} changedPaths={list.data.revisions.find((r) => r.revision === chosen)?.changedPaths ?? []} />
            {scope.canEdit && chosen !== newest ? (
              <Button className="mt-2" tone="primary" busy={restore.isPending} onClick={() => restore.mutate({ wid: scope.workspaceId, sid, rev: detail.data.revision.revision }, { onSuccess: onRestored })}>
                Bring back revision {detail.data.revision.revision} as a new revision
              </Button>
            ) : null}
            {restore.isError ? <Notice tone="error" className="mt-2">{errorMessage(restore.error)}</Notice> : null}
          </>
        ) : null}
      </Panel>
    </div>
  );
}
