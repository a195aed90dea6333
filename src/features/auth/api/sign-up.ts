import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, resetCsrfToken } from '../../../lib/api-client';
import { userResponseSchema, type User } from '../../../types/api';
import { setMe } from './get-me';

export type SignUpInput = { email: string; displayName: string; password: string };

export async function signUp(input: SignUpInput): Promise<User> {
  const { user } = await apiClient.post('/auth/sign-up', input, userResponseSchema);
  resetCsrfToken(); // the server started a new session
  return user;
}

export function useSignUp({ onSuccess }: { onSuccess?: (user: User) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (user) => {
      queryClient.clear();
      setMe(queryClient, user);
      onSuccess?.(user);
    },
  });
}
