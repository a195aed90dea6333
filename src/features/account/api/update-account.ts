import { useMutation } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { userResponseSchema, type User } from '../../../types/api';
import { accountKeys } from '../query-keys';

export type UpdateAccountInput = { displayName?: string; units?: User['units'] };

export async function updateAccount(input: UpdateAccountInput): Promise<User> {
  const { user } = await apiClient.patch('/account', input, userResponseSchema);
  return user;
}

export const useUpdateAccount = ({ onSuccess }: { onSuccess?: (user: User) => void } = {}) =>
  useMutation({ mutationKey: accountKeys.updateProfile(), mutationFn: updateAccount, onSuccess });

export const useUpdateUnits = ({ onSuccess }: { onSuccess?: (user: User) => void } = {}) =>
  useMutation({
    mutationKey: accountKeys.updateUnits(),
    mutationFn: (units: User['units']) => updateAccount({ units }),
    onSuccess,
  });
