import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { fabricKeys } from '../query-keys';

export async function deleteFabric(id: string): Promise<void> {
  await apiClient.delete(`/fabrics/${encodeURIComponent(id)}`);
}

export function useDeleteFabric({ onSuccess }: { onSuccess?: (id: string) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteFabric,
    onSuccess: async (_, id) => {
      queryClient.removeQueries({ queryKey: fabricKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: fabricKeys.list() });
      // The workspace's plan lists fabrics under its own key (features do not share code, only keys).
      await queryClient.invalidateQueries({ queryKey: ['workspace', 'fabrics'] });
      // Makes may name this fabric (their fabricId).
      await queryClient.invalidateQueries({ queryKey: ['makes'] });
      onSuccess?.(id);
    },
  });
}
