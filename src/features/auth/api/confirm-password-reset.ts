import { useMutation } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';

export type PasswordResetConfirmInput = { token: string; password: string };

export async function confirmPasswordReset(input: PasswordResetConfirmInput): Promise<void> {
  await apiClient.postNoContent('/auth/password-reset/confirm', input);
}

export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
