import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { makeKeys, type MakesListParams } from '../query-keys';
import { makeSummarySchema, type MakeSummary } from './schemas';

const makesResponseSchema = z.object({ makes: z.array(makeSummarySchema) });

/** The signed-in user's makes: the active ones, or the archived ones. */
export async function getMakes({ archived }: MakesListParams): Promise<MakeSummary[]> {
  const { makes } = await apiClient.get(`/makes?archived=${archived}`, makesResponseSchema);
  return makes;
}

export const makesQueryOptions = (params: MakesListParams) =>
  queryOptions({ queryKey: makeKeys.list(params), queryFn: () => getMakes(params) });

export const useMakes = (params: MakesListParams) => useQuery(makesQueryOptions(params));
