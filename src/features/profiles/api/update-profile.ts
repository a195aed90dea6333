import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import type { DatedSetInput } from '../model';
import { profileKeys } from '../query-keys';
import { profileResponseSchema, type Profile } from './schemas';

/** A new name, or a new dated set of measurements (history is never rewritten). */
export type UpdateProfileInput = { id: string } & ({ name: string } | DatedSetInput);

export async function updateProfile({ id, ...changes }: UpdateProfileInput): Promise<Profile> {
  const { profile } = await apiClient.patch(`/profiles/${encodeURIComponent(id)}`, changes, profileResponseSchema);
  return profile;
}

export function useUpdateProfile({ onSuccess }: { onSuccess?: (profile: Profile) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateProfile,
    onSuccess: async (profile) => {
      await queryClient.invalidateQueries({ queryKey: profileKeys.all });
      onSuccess?.(profile);
    },
  });
}
