import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { printKeys } from '../query-keys';
import { printJobSchema, type PrintJob } from './schemas';

const printsResponseSchema = z.object({ prints: z.array(printJobSchema) });

export type PrintsParams = { makeId?: string };

/** The signed-in user's prints, or those of one make, newest first (the server keeps the files). */
export async function getPrints(params: PrintsParams = {}): Promise<PrintJob[]> {
  const query = params.makeId === undefined ? '' : `?${new URLSearchParams({ makeId: params.makeId })}`;
  const { prints } = await apiClient.get(`/prints${query}`, printsResponseSchema);
  return prints;
}

export const printsQueryOptions = (params: PrintsParams = {}) => queryOptions({ queryKey: printKeys.list(params), queryFn: () => getPrints(params) });

export const usePrints = (params: PrintsParams = {}) => useQuery(printsQueryOptions(params));
