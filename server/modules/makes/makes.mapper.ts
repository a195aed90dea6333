import type { AlterationEntry, FitNote } from '../../../geometry/index.ts';
import type { MakeRevisionEntity } from './make-revision.entity.ts';
import type { MakeEntity } from './make.entity.ts';

export interface MakeSummaryDto {
  id: string;
  name: string;
  pattern: { id: string; name: string };
  profile: { id: string; name: string } | null;
  fabricNote: string;
  fabricId: string | null;
  fitNote: (FitNote & { updatedAt: string }) | null;
  sourceMakeId: string | null;
  latestRevision: number;
  alterationCount: number;
  archived: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface RevisionSummaryDto {
  number: number;
  summary: string;
  author: { id: string; displayName: string } | null;
  restoredFrom: number | null;
  alterationCount: number;
  createdAt: string;
}

export interface RevisionDto extends RevisionSummaryDto {
  alterations: AlterationEntry[];
}

export interface MakeDetailDto extends MakeSummaryDto {
  revision: RevisionDto;
}

export interface MakeRow {
  make: MakeEntity;
  patternName: string;
  profileName: string | null;
  alterationCount: number;
}

export const toMakeSummaryDto = ({ make, patternName, profileName, alterationCount }: MakeRow): MakeSummaryDto => ({
  id: make.id,
  name: make.name,
  pattern: { id: make.patternId, name: patternName },
  profile: make.profileId && profileName !== null ? { id: make.profileId, name: profileName } : null,
  fabricNote: make.fabricNote,
  fabricId: make.fabricId,
  fitNote: make.fitNote,
  sourceMakeId: make.sourceMakeId,
  latestRevision: make.latestRevision,
  alterationCount,
  archived: make.archivedAt !== null,
  createdAt: make.createdAt.toISOString(),
  updatedAt: make.updatedAt.toISOString(),
});

export const toRevisionSummaryDto = (r: MakeRevisionEntity, authorName: string | null): RevisionSummaryDto => ({
  number: r.number,
  summary: r.summary,
  author: r.authorId && authorName !== null ? { id: r.authorId, displayName: authorName } : null,
  restoredFrom: r.restoredFrom,
  alterationCount: r.alterations.length,
  createdAt: r.createdAt.toISOString(),
});

export const toRevisionDto = (r: MakeRevisionEntity, authorName: string | null): RevisionDto => ({
  ...toRevisionSummaryDto(r, authorName),
  alterations: r.alterations,
});
