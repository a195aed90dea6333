import { useMutation } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { accountKeys } from '../query-keys';

export type ChangePasswordInput = { currentPassword: string; newPassword: string };

export async function changePassword(input: ChangePasswordInput): Promise<void> {
  await apiClient.postNoContent('/account/password', input);
}

export const useChangePassword = () =>
  useMutation({ mutationKey: accountKeys.changePassword(), mutationFn: changePassword });
