import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { patternKeys } from '../query-keys';
import { patternResponseSchema, type PatternDetail } from '../types';

/** Owner only; `published: true` only for coaches and admins. `pattern` is the whole labelled geometry. */
export type UpdatePatternInput = { id: string; name?: string; pattern?: unknown; published?: boolean };

export async function updatePattern({ id, ...changes }: UpdatePatternInput): Promise<PatternDetail> {
  const { pattern } = await apiClient.patch(`/patterns/${encodeURIComponent(id)}`, changes, patternResponseSchema);
  return pattern;
}

export function useUpdatePattern({ onSuccess }: { onSuccess?: (pattern: PatternDetail) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePattern,
    onSuccess: (pattern) => {
      queryClient.setQueryData(patternKeys.detail(pattern.id), pattern);
      void queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
      onSuccess?.(pattern);
    },
  });
}
