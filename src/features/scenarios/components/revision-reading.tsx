import { ErrorState, LoadingState } from '../../../components/ui/states';
import { useRevision } from '../api/get-revision';
import { fieldChanges } from '../lib/document-paths';
import { DocumentOutline } from './document-outline';
import { RevisionChanges } from './revision-changes';

/**
 * One revision to read: the fields it changed since the revision before it (before and after),
 * its inputs laid out, and the file itself as JSON for those who want it.
 */
export function RevisionReading({ wid, sid, revision, document, changedPaths }: {
  wid: string;
  sid: string;
  revision: number;
  document: unknown;
  changedPaths: readonly string[];
}) {
  const previous = useRevision(wid, sid, revision > 1 ? revision - 1 : null);
  return (
    <div className="space-y-3">
      {revision > 1 ? (
        previous.data ? (
          <RevisionChanges from={revision - 1} changes={fieldChanges(previous.data.revision.document, document, changedPaths)} />
        ) : previous.isError ? (
          <ErrorState error={previous.error} retry={() => void previous.refetch()} />
        ) : (
          <LoadingState what={`Loading revision ${revision - 1} to compare`} />
        )
      ) : (
        <p className="text-sm text-ink-soft">The first revision: the scenario as it was started.</p>
      )}
      <section aria-label={`Inputs of revision ${revision}`}>
        <h3 className="mb-1 font-semibold">Inputs</h3>
        <div className="max-h-[28rem] overflow-auto rounded bg-paper p-2">
          <DocumentOutline value={document} />
        </div>
      </section>
      <details>
        <summary className="cursor-pointer text-sm text-ink-soft">The scenario file of this revision (JSON)</summary>
        <pre className="figure mt-1 max-h-[28rem] overflow-auto rounded bg-paper p-2 text-xs">{JSON.stringify(document, null, 2)}</pre>
      </details>
    </div>
  );
}
