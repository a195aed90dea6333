import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { makeKeys } from '../query-keys';
import { makeResponseSchema, type MakeDetail } from './schemas';

export type CreateMakeInput = {
  name: string;
  patternId: string;
  profileId?: string | null;
  fabricNote?: string;
};

export async function createMake(input: CreateMakeInput): Promise<MakeDetail> {
  const { make } = await apiClient.post('/makes', input, makeResponseSchema);
  return make;
}

export function useCreateMake({ onSuccess }: { onSuccess?: (make: MakeDetail) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMake,
    onSuccess: async (make) => {
      queryClient.setQueryData(makeKeys.detail(make.id), make);
      await queryClient.invalidateQueries({ queryKey: makeKeys.lists() });
      onSuccess?.(make);
    },
  });
}
