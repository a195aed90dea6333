import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { workspaceKeys } from '../query-keys';
import { type Revision, revisionSchema, type RevisionSummary, revisionSummarySchema } from './schemas';

export function getRevisions(makeId: string): Promise<RevisionSummary[]> {
  return apiClient.get(`/makes/${encodeURIComponent(makeId)}/revisions`, z.object({ revisions: z.array(revisionSummarySchema) })).then((r) => r.revisions);
}

export const revisionsQueryOptions = (makeId: string) => queryOptions({ queryKey: workspaceKeys.revisions(makeId), queryFn: () => getRevisions(makeId) });

export const useRevisions = (makeId: string, enabled = true) => useQuery({ ...revisionsQueryOptions(makeId), enabled });

export function getRevision(makeId: string, number: number): Promise<Revision> {
  return apiClient.get(`/makes/${encodeURIComponent(makeId)}/revisions/${number}`, z.object({ revision: revisionSchema })).then((r) => r.revision);
}

export const revisionQueryOptions = (makeId: string, number: number) =>
  queryOptions({ queryKey: workspaceKeys.revision(makeId, number), queryFn: () => getRevision(makeId, number), staleTime: Infinity });

export const useRevision = (makeId: string, number: number | null) =>
  useQuery({ ...revisionQueryOptions(makeId, number ?? 0), enabled: number !== null });
