import { z } from 'zod';
import type { AlterationEntry } from '../../../../geometry/index.ts';
import { apiClient } from '../../../lib/api-client';
import { type Revision, revisionSchema } from './schemas';

export interface SaveRevisionInput {
  makeId: string;
  baseRevision: number;
  alterations: readonly AlterationEntry[];
  summary: string;
  restoredFrom?: number;
}

/** Append a revision; rejects with ApiError code `stale_revision` (409) when someone saved first. */
export function saveRevision({ makeId, ...body }: SaveRevisionInput): Promise<Revision> {
  return apiClient.post(`/makes/${encodeURIComponent(makeId)}/revisions`, body, z.object({ revision: revisionSchema })).then((r) => r.revision);
}
