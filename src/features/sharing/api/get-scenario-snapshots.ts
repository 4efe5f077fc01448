import { queryOptions, useQuery } from '@tanstack/react-query';
import { scenarioSnapshotsResponseSchema } from '../../../contracts/api/snapshots';
import { apiJson } from '../../../lib/api-client';
import { sharingApi } from './sharing-paths';

/** GET …/scenarios/:sid/snapshots (editors and owners): this scenario's share links and where it was forked from. */
export function getScenarioSnapshots(wid: string, sid: string, signal?: AbortSignal) {
  return apiJson(sharingApi.scenarioSnapshots(wid, sid), scenarioSnapshotsResponseSchema, { signal });
}

export function getScenarioSnapshotsQueryOptions(wid: string, sid: string) {
  return queryOptions({ queryKey: ['snapshots', 'of-scenario', sid], queryFn: ({ signal }) => getScenarioSnapshots(wid, sid, signal) });
}

export function useScenarioSnapshots(wid: string, sid: string, enabled = true) {
  return useQuery({ ...getScenarioSnapshotsQueryOptions(wid, sid), enabled });
}
