import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, resetCsrfToken } from '../../../lib/api-client';
import { setMe } from './get-me';

export async function signOut(): Promise<void> {
  await apiClient.postNoContent('/auth/sign-out');
  resetCsrfToken(); // the session the token belonged to is gone
}

export function useSignOut({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.clear();
      setMe(queryClient, null);
      onSuccess?.();
    },
  });
}
