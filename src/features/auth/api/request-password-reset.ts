import { useMutation } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';

export type PasswordResetRequestInput = { email: string };

/** The server answers the same whether or not the address has an account. */
export async function requestPasswordReset(input: PasswordResetRequestInput): Promise<void> {
  await apiClient.postNoContent('/auth/password-reset', input);
}

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
