import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { patternKeys } from '../query-keys';
import { patternResponseSchema, type PatternDetail } from '../types';

/** One pattern with its geometry, import notes and whether the person asking may change it. */
export async function getPattern(id: string): Promise<PatternDetail> {
  const { pattern } = await apiClient.get(`/patterns/${encodeURIComponent(id)}`, patternResponseSchema);
  return pattern;
}

export const patternQueryOptions = (id: string) =>
  queryOptions({ queryKey: patternKeys.detail(id), queryFn: () => getPattern(id) });

export const usePattern = (id: string) => useQuery(patternQueryOptions(id));
