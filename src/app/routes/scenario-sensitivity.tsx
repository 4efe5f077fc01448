import { Link, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { useScenario } from '../../features/scenarios/api/get-scenario';
import { SensitivityPanel } from '../../features/sensitivity/components/sensitivity-panel';
import { useWorkspace } from '../../lib/workspace-context';
import { paths } from '../paths';

/** How the comparison of one saved scenario moves with price, efficacy and every other input, and how sure it is. */
export default function ScenarioSensitivityPage() {
  const { sid = '' } = useParams();
  const scope = useWorkspace();
  const scenario = useScenario(scope.workspaceId, sid);
  if (scenario.isPending) return <LoadingState what="Opening the scenario" />;
  if (scenario.isError) return <ErrorState error={scenario.error} retry={() => void scenario.refetch()} />;
  const record = scenario.data.scenario;
  return (
    <div>
      <p className="mb-1 text-sm">
        <Link className="text-spruce-700 underline" to={paths.scenario.to(scope.workspaceId, record.id)}>Back to the scenario</Link>
      </p>
      <h1 className="mb-1 text-xl font-semibold">Where the answer changes: {record.title}</h1>
      <SensitivityPanel workspaceId={scope.workspaceId} scenarioId={record.id} scenario={record.document} />
    </div>
  );
}
