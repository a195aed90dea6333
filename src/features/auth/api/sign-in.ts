import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, resetCsrfToken } from '../../../lib/api-client';
import { userResponseSchema, type User } from '../../../types/api';
import { setMe } from './get-me';

export type SignInInput = { email: string; password: string };

export async function signIn(input: SignInInput): Promise<User> {
  const { user } = await apiClient.post('/auth/sign-in', input, userResponseSchema);
  resetCsrfToken(); // the server started a new session
  return user;
}

export function useSignIn({ onSuccess }: { onSuccess?: (user: User) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      queryClient.clear();
      setMe(queryClient, user);
      onSuccess?.(user);
    },
  });
}
