import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import type { FabricProperties } from '../model';
import { fabricKeys } from '../query-keys';
import { fabricResponseSchema, type Fabric } from './schemas';

export type CreateFabricInput = { name: string; properties: FabricProperties };

export async function createFabric(input: CreateFabricInput): Promise<Fabric> {
  const { fabric } = await apiClient.post('/fabrics', input, fabricResponseSchema);
  return fabric;
}

export function useCreateFabric({ onSuccess }: { onSuccess?: (fabric: Fabric) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createFabric,
    onSuccess: async (fabric) => {
      queryClient.setQueryData(fabricKeys.detail(fabric.id), fabric);
      await queryClient.invalidateQueries({ queryKey: fabricKeys.list() });
      // The workspace's plan lists fabrics under its own key (features do not share code, only keys).
      await queryClient.invalidateQueries({ queryKey: ['workspace', 'fabrics'] });
      onSuccess?.(fabric);
    },
  });
}
