import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { printKeys } from '../query-keys';
import { isWorking, printResponseSchema, type PrintJob } from './schemas';

/** How often a queued or running print is asked about (ms). */
export const PRINT_POLL_INTERVAL = 1000;

export async function getPrint(id: string): Promise<PrintJob> {
  const { print } = await apiClient.get(`/prints/${encodeURIComponent(id)}`, printResponseSchema);
  return print;
}

/** One print; asked about again every second while it is queued or running. */
export const printQueryOptions = (id: string) =>
  queryOptions({
    queryKey: printKeys.detail(id),
    queryFn: () => getPrint(id),
    staleTime: 0,
    refetchInterval: (query) => {
      const status = query.state.data?.status;
      return status && isWorking(status) ? PRINT_POLL_INTERVAL : false;
    },
  });

export const usePrint = (id: string | null) =>
  useQuery({ ...printQueryOptions(id ?? ''), enabled: id !== null });
