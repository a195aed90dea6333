import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { printKeys } from '../query-keys';
import { printJobSchema, type PrintJob } from './schemas';

const printsResponseSchema = z.object({ prints: z.array(printJobSchema) });

/** The signed-in user's prints, newest first (the server keeps the files). */
export async function getPrints(): Promise<PrintJob[]> {
  const { prints } = await apiClient.get('/prints', printsResponseSchema);
  return prints;
}

export const printsQueryOptions = () => queryOptions({ queryKey: printKeys.list(), queryFn: getPrints });

export const usePrints = () => useQuery(printsQueryOptions());
