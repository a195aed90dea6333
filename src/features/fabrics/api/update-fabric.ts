import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import type { FabricProperties } from '../model';
import { fabricKeys } from '../query-keys';
import { fabricResponseSchema, type Fabric } from './schemas';

export type UpdateFabricInput = { id: string; name?: string; properties?: FabricProperties };

/** A new name and/or properties (the properties replace the old ones whole). */
export async function updateFabric({ id, ...changes }: UpdateFabricInput): Promise<Fabric> {
  const { fabric } = await apiClient.patch(`/fabrics/${encodeURIComponent(id)}`, changes, fabricResponseSchema);
  return fabric;
}

export function useUpdateFabric({ onSuccess }: { onSuccess?: (fabric: Fabric) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateFabric,
    onSuccess: async (fabric) => {
      queryClient.setQueryData(fabricKeys.detail(fabric.id), fabric);
      await queryClient.invalidateQueries({ queryKey: fabricKeys.list() });
      // The workspace's plan lists fabrics under its own key (features do not share code, only keys).
      await queryClient.invalidateQueries({ queryKey: ['workspace', 'fabrics'] });
      onSuccess?.(fabric);
    },
  });
}
