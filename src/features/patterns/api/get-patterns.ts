import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { patternKeys, type PatternScope } from '../query-keys';
import { patternSummarySchema, type PatternSummary } from '../types';

const patternsResponseSchema = z.object({ patterns: z.array(patternSummarySchema) });

/** The signed-in person's own patterns (`mine`) or the shared library (published by coaches). */
export async function getPatterns(scope: PatternScope): Promise<PatternSummary[]> {
  const { patterns } = await apiClient.get(`/patterns?scope=${scope}`, patternsResponseSchema);
  return patterns;
}

export const patternsQueryOptions = (scope: PatternScope) =>
  queryOptions({ queryKey: patternKeys.list(scope), queryFn: () => getPatterns(scope) });

export const usePatterns = (scope: PatternScope) => useQuery(patternsQueryOptions(scope));
