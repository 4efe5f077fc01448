import { useQueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { Link, useParams } from 'react-router-dom';
import { optionFromFixture } from '../../contracts/api/fixtures';
import { ErrorState, LoadingState } from '../../components/ui/states';
import { useFixtures } from '../../features/fixtures/api/get-fixtures';
import { getScenarioQueryOptions, useScenario } from '../../features/scenarios/api/get-scenario';
import { ScenarioEditor } from '../../features/scenarios/components/editor/scenario-editor';
import type { LibraryEntry } from '../../features/scenarios/components/editor/library-entry';
import { SharePanel } from '../../features/sharing/components/share-panel';
import { useWorkspace } from '../../lib/workspace-context';
import { paths } from '../paths';

/** The scenario workbench; it brings the workspace's fixture library to the editor. */
export default function ScenarioEditorPage() {
  const { sid = '' } = useParams();
  const scope = useWorkspace();
  const qc = useQueryClient();
  const scenario = useScenario(scope.workspaceId, sid);
  const fixtures = useFixtures(scope.workspaceId);
  const library = useMemo<LibraryEntry[] | undefined>(
    () =>
      fixtures.data?.fixtures.map(({ id: _id, workspaceId: _w, createdAt: _c, updatedAt: _u, updatedBy: _b, ...fields }) => ({
        key: fields.key,
        label: fields.label,
        dataSource: fields.dataSource,
        measurementId: fields.measurementId ?? null,
        option: optionFromFixture(fields),
      })),
    [fixtures.data],
  );
  // Once loaded, the editor stays mounted whatever a later fetch does, so typed input is never lost.
  if (!scenario.data) {
    if (scenario.isError) return <ErrorState error={scenario.error} retry={() => void scenario.refetch()} />;
    return <LoadingState what="Opening the scenario" />;
  }
  const record = scenario.data.scenario;
  return (
    <div>
      <p className="mb-1 text-sm">
        <Link className="text-spruce-700 underline" to={paths.scenarios.to(scope.workspaceId)}>All scenarios</Link>
        {' · '}
        <Link className="text-spruce-700 underline" to={paths.scenarioSensitivity.to(scope.workspaceId, record.id)}>Sensitivity and uncertainty of the saved version</Link>
      </p>
      <h1 className="mb-2 text-xl font-semibold">{record.title}</h1>
      {scope.canEdit ? (
        <div className="mb-3">
          <SharePanel wid={scope.workspaceId} sid={record.id} revision={record.revision} />
        </div>
      ) : null}
      <ScenarioEditor
        key={record.id}
        record={record}
        scope={scope}
        library={library}
        historyHref={paths.scenarioHistory.to(scope.workspaceId, record.id)}
        onLoadLatest={async () => (await qc.fetchQuery({ ...getScenarioQueryOptions(scope.workspaceId, record.id), staleTime: 0 })).scenario}
      />
    </div>
  );
}
