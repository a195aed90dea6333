import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { fabricKeys } from '../query-keys';
import { fabricsResponseSchema, type Fabric } from './schemas';

/** The signed-in sewist's fabrics, by name. */
export async function getFabrics(): Promise<Fabric[]> {
  const { fabrics } = await apiClient.get('/fabrics', fabricsResponseSchema);
  return fabrics;
}

export const fabricsQueryOptions = () => queryOptions({ queryKey: fabricKeys.list(), queryFn: getFabrics });

export const useFabrics = () => useQuery(fabricsQueryOptions());
