import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from '../../../contracts/zod-messages';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

export const exampleListSchema = z.object({ examples: z.array(z.object({ id: z.string(), title: z.string() })) });
export type ExampleList = z.infer<typeof exampleListSchema>;

/** GET /api/examples: the shipped invented demo scenarios, id and title. */
export function getExamples(signal?: AbortSignal): Promise<ExampleList> {
  return apiJson(apiPaths.examples(), exampleListSchema, { signal });
}

export function getExamplesQueryOptions() {
  return queryOptions({ queryKey: ['examples', 'list'], queryFn: ({ signal }) => getExamples(signal), staleTime: Infinity });
}

export function useExamples() {
  return useQuery(getExamplesQueryOptions());
}
