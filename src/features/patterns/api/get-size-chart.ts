import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { patternKeys } from '../query-keys';

const measures = z.record(z.string(), z.number());

/** A size table as the server sends it (geometry/fit/chart.ts SizeChart). */
export const sizeChartSchema = z.object({
  name: z.string().optional(),
  source: z.enum(['printed', 'geometry']),
  sizes: z.array(z.object({ size: z.string(), garment: measures, body: measures.optional() })),
  notes: z.array(z.string()),
});
export type SizeChart = z.infer<typeof sizeChartSchema>;

export const sizeChartsSchema = z.object({
  printed: sizeChartSchema.nullable(),
  measured: sizeChartSchema.nullable(),
  measuredError: z.string().optional(),
});
export type SizeCharts = z.infer<typeof sizeChartsSchema>;

/** Keys under the pattern's own, so changing the pattern refreshes its tables too. */
export const sizeChartKeys = {
  all: (patternId: string) => [...patternKeys.detail(patternId), 'size-chart'] as const,
  one: (patternId: string, seamAllowance: number | undefined) => [...sizeChartKeys.all(patternId), seamAllowance ?? null] as const,
};

/** The printed table (if typed in) and the one measured on the pieces, less `seamAllowance` mm a side. */
export function getSizeCharts(patternId: string, seamAllowance?: number): Promise<SizeCharts> {
  const query = seamAllowance !== undefined && seamAllowance > 0 ? `?seamAllowance=${encodeURIComponent(String(Math.round(seamAllowance * 1000) / 1000))}` : '';
  return apiClient.get(`/patterns/${encodeURIComponent(patternId)}/size-chart${query}`, sizeChartsSchema);
}

export const sizeChartsQueryOptions = (patternId: string, seamAllowance?: number) =>
  queryOptions({ queryKey: sizeChartKeys.one(patternId, seamAllowance), queryFn: () => getSizeCharts(patternId, seamAllowance), placeholderData: keepPreviousData });

export const useSizeCharts = (patternId: string, seamAllowance?: number) => useQuery(sizeChartsQueryOptions(patternId, seamAllowance));
