import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import type { chartInputFromDraft } from '../model/size-chart';
import { sizeChartKeys, sizeChartSchema, type SizeChart, type SizeCharts } from './get-size-chart';

export type SizeChartInput = ReturnType<typeof chartInputFromDraft>;

/** Owner only: the printed table replaces the one kept (400 with fields for a bad table). */
export function saveSizeChart({ patternId, chart }: { patternId: string; chart: SizeChartInput }): Promise<SizeChart> {
  return apiClient.put(`/patterns/${encodeURIComponent(patternId)}/size-chart`, { chart }, z.object({ printed: sizeChartSchema })).then((r) => r.printed);
}

/** Owner only: no printed table any more (the plan then measures the pieces). */
export const deleteSizeChart = ({ patternId }: { patternId: string }) => apiClient.delete(`/patterns/${encodeURIComponent(patternId)}/size-chart`);

export function useSaveSizeChart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveSizeChart,
    onSuccess: (printed, { patternId }) => {
      // Shown at once (the measured side is unchanged), then checked with the server.
      queryClient.setQueriesData<SizeCharts>({ queryKey: sizeChartKeys.all(patternId) }, (old) => (old ? { ...old, printed } : old));
      void queryClient.invalidateQueries({ queryKey: sizeChartKeys.all(patternId) });
    },
  });
}

export function useDeleteSizeChart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteSizeChart,
    onSuccess: (_nothing, { patternId }) => void queryClient.invalidateQueries({ queryKey: sizeChartKeys.all(patternId) }),
  });
}
