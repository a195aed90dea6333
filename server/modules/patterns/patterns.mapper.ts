import type { Pattern } from '../../../geometry/index.ts';
import type { PatternEntity } from './pattern.entity.ts';

export interface PatternSummaryDto {
  id: string;
  name: string;
  owner: { id: string; displayName: string };
  sourceFormat: PatternEntity['sourceFormat'];
  sourceName: string;
  pieceCount: number;
  sizes: string[];
  published: boolean;
  publishedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface PatternDetailDto extends PatternSummaryDto {
  importNotes: string[];
  /** May the person asking change it (name, labels, publishing)? */
  canEdit: boolean;
  pattern: Pattern;
}

export const toPatternSummaryDto = (p: PatternEntity, ownerName: string): PatternSummaryDto => ({
  id: p.id,
  name: p.name,
  owner: { id: p.ownerId, displayName: ownerName },
  sourceFormat: p.sourceFormat,
  sourceName: p.sourceName,
  pieceCount: p.pieceCount,
  sizes: p.sizes,
  published: p.publishedAt !== null,
  publishedAt: p.publishedAt?.toISOString() ?? null,
  createdAt: p.createdAt.toISOString(),
  updatedAt: p.updatedAt.toISOString(),
});

export const toPatternDetailDto = (p: PatternEntity, ownerName: string, canEdit: boolean, pattern: Pattern): PatternDetailDto => ({
  ...toPatternSummaryDto(p, ownerName),
  importNotes: p.importNotes,
  canEdit,
  pattern,
});
