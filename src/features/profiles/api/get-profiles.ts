import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { profileKeys } from '../query-keys';
import { profilesResponseSchema, type Profile } from './schemas';

/** The signed-in sewist's measurement profiles, each with its current set. */
export async function getProfiles(): Promise<Profile[]> {
  const { profiles } = await apiClient.get('/profiles', profilesResponseSchema);
  return profiles;
}

/** Always checked again on opening the page: the new-make form adds profiles too, under its own key. */
export const profilesQueryOptions = () => queryOptions({ queryKey: profileKeys.list(), queryFn: getProfiles, staleTime: 0 });

export const useProfiles = () => useQuery(profilesQueryOptions());
