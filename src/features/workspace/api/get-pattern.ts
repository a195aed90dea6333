import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { type Pattern, parsePattern } from '../../../../geometry/index.ts';
import { apiClient } from '../../../lib/api-client';
import { workspaceKeys } from '../query-keys';

const responseSchema = z.object({
  pattern: z.object({ id: z.string(), name: z.string(), sizes: z.array(z.string()), pattern: z.unknown() }),
});

export interface WorkspacePattern {
  id: string;
  name: string;
  sizes: string[];
  pattern: Pattern;
}

/** The make's pattern geometry, parsed with the engine's own schema. */
export async function getWorkspacePattern(id: string): Promise<WorkspacePattern> {
  const { pattern } = await apiClient.get(`/patterns/${encodeURIComponent(id)}`, responseSchema);
  return { id: pattern.id, name: pattern.name, sizes: pattern.sizes, pattern: parsePattern(pattern.pattern) };
}

export const workspacePatternQueryOptions = (id: string) =>
  queryOptions({ queryKey: workspaceKeys.pattern(id), queryFn: () => getWorkspacePattern(id), staleTime: 60_000 });

export const useWorkspacePattern = (id: string | undefined) =>
  useQuery({ ...workspacePatternQueryOptions(id ?? ''), enabled: id !== undefined });
