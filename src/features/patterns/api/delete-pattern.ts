import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { patternKeys } from '../query-keys';

/** Owner only; 409 `in_use` while makes use the pattern. */
export async function deletePattern(id: string): Promise<void> {
  await apiClient.delete(`/patterns/${encodeURIComponent(id)}`);
}

export function useDeletePattern() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePattern,
    onSuccess: (_, id) => {
      queryClient.removeQueries({ queryKey: patternKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
    },
  });
}
