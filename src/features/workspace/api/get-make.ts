import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { workspaceKeys } from '../query-keys';
import { type WorkspaceMake, workspaceMakeSchema } from './schemas';

/** The make with its newest revision (the alteration list the workspace starts from). */
export function getWorkspaceMake(id: string): Promise<WorkspaceMake> {
  return apiClient.get(`/makes/${encodeURIComponent(id)}`, z.object({ make: workspaceMakeSchema })).then((r) => r.make);
}

export const workspaceMakeQueryOptions = (id: string) =>
  queryOptions({ queryKey: workspaceKeys.make(id), queryFn: () => getWorkspaceMake(id), staleTime: Infinity });

export const useWorkspaceMake = (id: string) => useQuery(workspaceMakeQueryOptions(id));
