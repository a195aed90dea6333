import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { userResponseSchema, type Role, type User } from '../../../types/api';
import { adminUserKeys } from '../query-keys';

export type UpdateUserRoleInput = { id: string; role: Role };

export async function updateUserRole({ id, role }: UpdateUserRoleInput): Promise<User> {
  const { user } = await apiClient.patch(
    `/admin/users/${encodeURIComponent(id)}`,
    { role },
    userResponseSchema,
  );
  return user;
}

export function useUpdateUserRole({ onSuccess }: { onSuccess?: (user: User) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUserRole,
    onSuccess: (user) => {
      queryClient.setQueryData<User[]>(adminUserKeys.list(), (users) =>
        users?.map((each) => (each.id === user.id ? user : each)),
      );
      onSuccess?.(user);
    },
  });
}
