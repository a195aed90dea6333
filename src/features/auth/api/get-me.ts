import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { apiClient, isApiError } from '../../../lib/api-client';
import { userResponseSchema, type User } from '../../../types/api';
import { authKeys } from '../query-keys';

/** The signed-in user, or `null` when nobody is signed in (the server answers 401). */
export async function getMe(): Promise<User | null> {
  try {
    const { user } = await apiClient.get('/auth/me', userResponseSchema);
    return user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 5 * 60_000 });

export const useMe = () => useQuery(meQueryOptions());

/** Record who is signed in now, after sign-in, sign-up, sign-out or an account change. */
export function setMe(queryClient: QueryClient, user: User | null): void {
  queryClient.setQueryData(authKeys.me(), user);
}
