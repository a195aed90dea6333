import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { profileKeys } from '../query-keys';

/** Delete a profile and its history; makes that used it keep working without one. */
export async function deleteProfile(id: string): Promise<void> {
  await apiClient.delete(`/profiles/${encodeURIComponent(id)}`);
}

export function useDeleteProfile({ onSuccess }: { onSuccess?: (id: string) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteProfile,
    onSuccess: async (_, id) => {
      queryClient.removeQueries({ queryKey: profileKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: profileKeys.all });
      // A make showing this profile now shows none.
      await queryClient.invalidateQueries({ queryKey: ['makes'] });
      onSuccess?.(id);
    },
  });
}
