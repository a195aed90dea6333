import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { makeKeys } from '../query-keys';
import { makeResponseSchema, type MakeDetail } from './schemas';

export type DuplicateMakeInput = { id: string; name?: string };

/** "Sew it again": a new make that starts from the newest alterations of this one. */
export async function duplicateMake({ id, name }: DuplicateMakeInput): Promise<MakeDetail> {
  const { make } = await apiClient.post(
    `/makes/${encodeURIComponent(id)}/duplicate`,
    name === undefined ? {} : { name },
    makeResponseSchema,
  );
  return make;
}

export function useDuplicateMake({ onSuccess }: { onSuccess?: (make: MakeDetail) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateMake,
    onSuccess: async (make) => {
      queryClient.setQueryData(makeKeys.detail(make.id), make);
      await queryClient.invalidateQueries({ queryKey: makeKeys.lists() });
      onSuccess?.(make);
    },
  });
}
