import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { patternChoiceKeys, type PatternScope } from '../query-keys';

export const patternChoiceSchema = z.object({
  id: z.string(),
  name: z.string(),
  owner: z.object({ id: z.string(), displayName: z.string() }),
  sizes: z.array(z.string()),
  pieceCount: z.number(),
  published: z.boolean(),
});
export type PatternChoice = z.infer<typeof patternChoiceSchema>;

const patternsResponseSchema = z.object({ patterns: z.array(patternChoiceSchema) });

/** Patterns a make can start from: the user's own (`mine`) or the shared library. */
export async function getPatternChoices(scope: PatternScope): Promise<PatternChoice[]> {
  const { patterns } = await apiClient.get(`/patterns?scope=${scope}`, patternsResponseSchema);
  return patterns;
}

export const patternChoicesQueryOptions = (scope: PatternScope) =>
  queryOptions({ queryKey: patternChoiceKeys.list(scope), queryFn: () => getPatternChoices(scope) });

export const usePatternChoices = (scope: PatternScope) => useQuery(patternChoicesQueryOptions(scope));
