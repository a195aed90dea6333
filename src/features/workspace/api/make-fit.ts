import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { workspaceKeys } from '../query-keys';
import { fitNoteSchema } from './fit-note';

/** What the fit panels read of a make: its fabric, its fit note and the make it was sewn again from. */
const makeFitSchema = z.object({
  id: z.string(),
  fabricId: z.string().nullable().optional().transform((v) => v ?? null),
  fitNote: fitNoteSchema.nullable().optional().transform((v) => v ?? null),
  sourceMakeId: z.string().nullable().optional().transform((v) => v ?? null),
});
export type MakeFit = z.infer<typeof makeFitSchema>;

export const makeFitKey = (makeId: string) => [...workspaceKeys.make(makeId), 'fit'] as const;

export function getMakeFit(makeId: string): Promise<MakeFit> {
  return apiClient.get(`/makes/${encodeURIComponent(makeId)}`, z.object({ make: makeFitSchema })).then((r) => r.make);
}

export const makeFitQueryOptions = (makeId: string) => queryOptions({ queryKey: makeFitKey(makeId), queryFn: () => getMakeFit(makeId) });

export const useMakeFit = (makeId: string) => useQuery(makeFitQueryOptions(makeId));

/** The make's fabric (one of the person's kept fabrics, or none). */
export function setMakeFabric({ makeId, fabricId }: { makeId: string; fabricId: string | null }): Promise<MakeFit> {
  return apiClient.patch(`/makes/${encodeURIComponent(makeId)}`, { fabricId }, z.object({ make: makeFitSchema })).then((r) => r.make);
}

export function useSetMakeFabric() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setMakeFabric,
    onSuccess: (make, { makeId }) => {
      queryClient.setQueryData(makeFitKey(makeId), make);
      // The makes list shows the make too.
      void queryClient.invalidateQueries({ queryKey: ['makes'] });
    },
  });
}
