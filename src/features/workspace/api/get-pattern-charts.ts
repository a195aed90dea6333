import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { workspaceKeys } from '../query-keys';

/** Only whether the pattern has a printed size table (the plan can use it or the measured one). */
const chartsSchema = z.object({ printed: z.object({ name: z.string().optional() }).passthrough().nullable() }).passthrough();

export const patternChartsQueryOptions = (patternId: string) =>
  queryOptions({
    queryKey: [...workspaceKeys.pattern(patternId), 'size-chart'] as const,
    queryFn: () => apiClient.get(`/patterns/${encodeURIComponent(patternId)}/size-chart`, chartsSchema).then((r) => ({ hasPrinted: r.printed !== null, printedName: r.printed?.name })),
  });

export const usePatternCharts = (patternId: string) => useQuery(patternChartsQueryOptions(patternId));
