import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { profileKeys } from '../query-keys';
import { profileSchema, type Measurements, type Profile } from './get-profiles';

export type CreateProfileInput = { name: string; measurements: Measurements };

const profileResponseSchema = z.object({ profile: profileSchema });

export async function createProfile(input: CreateProfileInput): Promise<Profile> {
  const { profile } = await apiClient.post('/profiles', input, profileResponseSchema);
  return profile;
}

export function useCreateProfile({ onSuccess }: { onSuccess?: (profile: Profile) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProfile,
    onSuccess: async (profile) => {
      queryClient.setQueryData<Profile[]>(profileKeys.list(), (profiles) =>
        profiles ? [...profiles, profile] : [profile],
      );
      // the Fit planner's lists sit under the same root: they are refetched too
      await queryClient.invalidateQueries({ queryKey: profileKeys.all });
      onSuccess?.(profile);
    },
  });
}
