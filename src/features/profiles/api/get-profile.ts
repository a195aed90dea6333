import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { profileKeys } from '../query-keys';
import { profileDetailResponseSchema, type ProfileDetail } from './schemas';

/** One profile with its whole dated history, newest first. */
export async function getProfile(id: string): Promise<ProfileDetail> {
  const { profile } = await apiClient.get(`/profiles/${encodeURIComponent(id)}`, profileDetailResponseSchema);
  return profile;
}

export const profileQueryOptions = (id: string) =>
  queryOptions({ queryKey: profileKeys.detail(id), queryFn: () => getProfile(id) });

export const useProfile = (id: string) => useQuery(profileQueryOptions(id));
