import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { errorMessage } from '../../../lib/api-client';
import type { WorkspaceScope } from '../../../lib/workspace-context';
import { useCreateScenario } from '../api/create-scenario';
import { starterScenario } from '../starter';

/** Starts a scenario from the plain starter document and opens it. */
export function NewScenarioButton({ scope, onCreated }: { scope: WorkspaceScope; onCreated: (sid: string) => void }) {
  const create = useCreateScenario();
  if (!scope.canEdit) return null;
  return (
    <div className="flex flex-col items-end gap-1">
      <Button
        tone="primary"
        busy={create.isPending}
        onClick={() => create.mutate({ wid: scope.workspaceId, input: { document: starterScenario('New room', scope.currency) } }, { onSuccess: (r) => onCreated(r.scenario.id) })}
      >
        Start a new scenario
      </Button>
      {create.isError ? <Notice tone="error">{errorMessage(create.error)}</Notice> : null}
    </div>
  );
}
