import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { userSchema, type User } from '../../../types/api';
import { adminUserKeys } from '../query-keys';

const usersResponseSchema = z.object({ users: z.array(userSchema) });

export async function getUsers(): Promise<User[]> {
  const { users } = await apiClient.get('/admin/users', usersResponseSchema);
  return users;
}

export const usersQueryOptions = () =>
  queryOptions({ queryKey: adminUserKeys.list(), queryFn: getUsers });

export const useUsers = () => useQuery(usersQueryOptions());
