import { useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { isApiError } from '../../lib/api-client';
import { useSharedSnapshot } from '../../features/sharing/api/get-shared-snapshot';
import { LinkUnavailable } from '../../features/sharing/components/link-unavailable';
import { SnapshotPage } from '../../features/sharing/components/snapshot-page';

/** /s/:id: a shared snapshot, readable without an account. */
export default function SharedSnapshotPage() {
  const { id = '' } = useParams();
  const shared = useSharedSnapshot(id);
  if (shared.data) return <SnapshotPage data={shared.data} />;
  if (shared.isError) {
    const e = shared.error;
    if (isApiError(e, 'gone')) return <LinkUnavailable status={410} reason={e.fields[0]?.message} />;
    if (isApiError(e, 'not_found')) return <LinkUnavailable status={404} />;
    return <ErrorState error={e} retry={() => void shared.refetch()} />;
  }
  return <LoadingState what="Opening the shared snapshot" />;
}
