import { useCallback } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { NewScenarioButton } from '../../features/scenarios/components/new-scenario-button';
import { ScenarioList } from '../../features/scenarios/components/scenario-list';
import { useWorkspace } from '../../lib/workspace-context';
import { paths } from '../paths';

/** The scenario list; search and page live in the address so they survive a reload. */
export default function Scenarios() {
  const scope = useWorkspace();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const q = params.get('q') ?? '';
  const page = Math.max(1, Number(params.get('page') ?? 1) || 1);
  const onQuery = useCallback(
    (next: { q: string; page: number }) => void navigate(paths.scenarios.to(scope.workspaceId, next), { replace: true }),
    [navigate, scope.workspaceId],
  );
  return (
    <div>
      <h1 className="sr-only">Scenarios</h1>
      <ScenarioList
        scope={scope}
        q={q}
        page={page}
        onQuery={onQuery}
        newButton={<NewScenarioButton scope={scope} onCreated={(sid) => void navigate(paths.scenario.to(scope.workspaceId, sid))} />}
      />
    </div>
  );
}
