import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from '../../../contracts/zod-messages';
import { scenarioSchema } from '../../../contracts/scenario';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

export const exampleSchema = z.object({ id: z.string(), title: z.string(), scenario: scenarioSchema });
export type Example = z.infer<typeof exampleSchema>;

/** GET /api/examples/:id: one demo scenario, validated here with the shared scenario schema. */
export function getExample(id: string, signal?: AbortSignal): Promise<Example> {
  return apiJson(apiPaths.example(id), exampleSchema, { signal });
}

export function getExampleQueryOptions(id: string) {
  return queryOptions({ queryKey: ['examples', 'detail', id], queryFn: ({ signal }) => getExample(id, signal), staleTime: Infinity });
}

export function useExample(id: string | undefined) {
  return useQuery({ ...getExampleQueryOptions(id ?? ''), enabled: Boolean(id) });
}
