import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { workspaceKeys } from '../query-keys';

const girth = z.object({ verdict: z.enum(['tight', 'right', 'loose']), amount: z.number().min(0).optional() });
const length = z.object({ verdict: z.enum(['short', 'right', 'long']), amount: z.number().min(0).optional() });

/** How a make fitted (contract #6 FitNote). */
export const fitNoteSchema = z.object({
  levels: z.object({ waist: girth.optional(), hip: girth.optional(), thigh: girth.optional(), knee: girth.optional(), calf: girth.optional(), rise: length.optional(), length: length.optional() }),
  nextTime: z.string(),
  updatedAt: z.string().optional(),
});
export type FitNoteDto = z.infer<typeof fitNoteSchema>;

export interface SaveFitNoteInput {
  makeId: string;
  note: { levels: FitNoteDto['levels']; nextTime: string };
}

/** Owner only: the make's fit note, replaced whole. */
export function saveFitNote({ makeId, note }: SaveFitNoteInput): Promise<FitNoteDto> {
  return apiClient.put(`/makes/${encodeURIComponent(makeId)}/fit-note`, note, z.object({ fitNote: fitNoteSchema })).then((r) => r.fitNote);
}

export const deleteFitNote = ({ makeId }: { makeId: string }) => apiClient.delete(`/makes/${encodeURIComponent(makeId)}/fit-note`);

export function useSaveFitNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveFitNote,
    onSuccess: (_note, { makeId }) => void queryClient.invalidateQueries({ queryKey: [...workspaceKeys.make(makeId), 'fit'] }),
  });
}

export function useDeleteFitNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteFitNote,
    onSuccess: (_nothing, { makeId }) => void queryClient.invalidateQueries({ queryKey: [...workspaceKeys.make(makeId), 'fit'] }),
  });
}
