import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { makeKeys } from '../query-keys';
import { revisionSchema, revisionSummarySchema, type Revision, type RevisionSummary } from './schemas';

const revisionsResponseSchema = z.object({ revisions: z.array(revisionSummarySchema) });
const revisionResponseSchema = z.object({ revision: revisionSchema });

/** A make's revisions, newest first (summaries, without the alterations). */
export async function getMakeRevisions(makeId: string): Promise<RevisionSummary[]> {
  const { revisions } = await apiClient.get(
    `/makes/${encodeURIComponent(makeId)}/revisions`,
    revisionsResponseSchema,
  );
  return revisions;
}

export const makeRevisionsQueryOptions = (makeId: string) =>
  queryOptions({ queryKey: makeKeys.revisions(makeId), queryFn: () => getMakeRevisions(makeId) });

export const useMakeRevisions = (makeId: string) => useQuery(makeRevisionsQueryOptions(makeId));

/** One revision of a make, with its alterations. Revisions never change once saved. */
export async function getMakeRevision(makeId: string, number: number): Promise<Revision> {
  const { revision } = await apiClient.get(
    `/makes/${encodeURIComponent(makeId)}/revisions/${number}`,
    revisionResponseSchema,
  );
  return revision;
}

export const makeRevisionQueryOptions = (makeId: string, number: number) =>
  queryOptions({
    queryKey: makeKeys.revision(makeId, number),
    queryFn: () => getMakeRevision(makeId, number),
    staleTime: Infinity,
  });

export const useMakeRevision = (makeId: string, number: number) =>
  useQuery(makeRevisionQueryOptions(makeId, number));
