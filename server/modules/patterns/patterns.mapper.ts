import type { Pattern, SizeChart } from '../../../geometry/index.ts';
import type { PatternEntity } from './pattern.entity.ts';

export interface PatternSummaryDto {
  id: string;
  name: string;
  owner: { id: string; displayName: string };
  sourceFormat: PatternEntity['sourceFormat'];
  sourceName: string;
  pieceCount: number;
  sizes: string[];
  /** Has its owner typed in the size table printed with it? */
  hasSizeChart: boolean;
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
  hasSizeChart: p.sizeChart !== null,
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

/** A pattern's size tables: the printed one (typed by its owner) and the one measured on its pieces. */
export interface SizeChartsDto {
  printed: SizeChart | null;
  measured: SizeChart | null;
  /** Why the pieces could not be measured, when `measured` is null. */
  measuredError?: string;
}
