import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { makeKeys } from '../query-keys';
import { makeResponseSchema, type MakeDetail } from './schemas';

/** One make with its newest revision (and that revision's alterations). */
export async function getMake(id: string): Promise<MakeDetail> {
  const { make } = await apiClient.get(`/makes/${encodeURIComponent(id)}`, makeResponseSchema);
  return make;
}

export const makeQueryOptions = (id: string) =>
  queryOptions({ queryKey: makeKeys.detail(id), queryFn: () => getMake(id) });

export const useMake = (id: string) => useQuery(makeQueryOptions(id));
