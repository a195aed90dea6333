import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import type { DatedSetInput } from '../model';
import { profileKeys } from '../query-keys';
import { profileResponseSchema, type Profile } from './schemas';

export type CreateProfileInput = { name: string } & DatedSetInput;

/** A new profile with its first dated set. */
export async function createProfile(input: CreateProfileInput): Promise<Profile> {
  const { profile } = await apiClient.post('/profiles', input, profileResponseSchema);
  return profile;
}

export function useCreateProfile({ onSuccess }: { onSuccess?: (profile: Profile) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProfile,
    onSuccess: async (profile) => {
      await queryClient.invalidateQueries({ queryKey: profileKeys.all });
      onSuccess?.(profile);
    },
  });
}
