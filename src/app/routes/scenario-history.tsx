import { Link, useNavigate, useParams } from 'react-router-dom';
import { RevisionHistory } from '../../features/scenarios/components/revision-history';
import { useWorkspace } from '../../lib/workspace-context';
import { paths } from '../paths';

/** A scenario's revisions: who changed what and when; look at one, or bring it back as a new revision. */
export default function ScenarioHistoryPage() {
  const { sid = '' } = useParams();
  const scope = useWorkspace();
  const navigate = useNavigate();
  return (
    <div>
      <p className="mb-1 text-sm">
        <Link className="text-spruce-700 underline" to={paths.scenario.to(scope.workspaceId, sid)}>Back to the scenario</Link>
      </p>
      <h1 className="mb-3 text-xl font-semibold">History of changes</h1>
      <RevisionHistory scope={scope} sid={sid} onRestored={() => void navigate(paths.scenario.to(scope.workspaceId, sid))} />
    </div>
  );
}
