import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { makeKeys } from '../query-keys';
import { makeResponseSchema, type MakeDetail } from './schemas';

export type UpdateMakeInput = {
  id: string;
  name?: string;
  profileId?: string | null;
  fabricNote?: string;
  archived?: boolean;
};

/** Rename, change the profile or fabric note, archive or bring back. */
export async function updateMake({ id, ...changes }: UpdateMakeInput): Promise<MakeDetail> {
  const { make } = await apiClient.patch(`/makes/${encodeURIComponent(id)}`, changes, makeResponseSchema);
  return make;
}

export function useUpdateMake({ onSuccess }: { onSuccess?: (make: MakeDetail) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMake,
    onSuccess: async (make) => {
      queryClient.setQueryData(makeKeys.detail(make.id), make);
      await queryClient.invalidateQueries({ queryKey: makeKeys.lists() });
      onSuccess?.(make);
    },
  });
}
