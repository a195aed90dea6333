import { Column, Entity } from 'typeorm';
import type { SizeChart } from '../../../geometry/index.ts';
import { OwnedEntity } from '../../db/owned-entity.ts';

export const PATTERN_SOURCES = ['svg', 'dxf', 'json', 'demo'] as const;
export type PatternSource = (typeof PATTERN_SOURCES)[number];

/** An uploaded pattern: the imported geometry (never the uploaded file), private until published. */
@Entity({ name: 'patterns' })
export class PatternEntity extends OwnedEntity {
  @Column('text', { name: 'source_format' })
  sourceFormat: PatternSource;

  /** The uploaded file's name, for the person's reference only. */
  @Column('text', { name: 'source_name' })
  sourceName: string;

  /** The pattern in Blockwright's format (geometry/model.ts). */
  @Column('jsonb', { select: false })
  data: unknown;

  @Column('integer', { name: 'piece_count' })
  pieceCount: number;

  /** Every size label found, smallest first. */
  @Column('jsonb')
  sizes: string[];

  /** What the importer guessed and the person should check. */
  @Column('jsonb', { name: 'import_notes' })
  importNotes: string[];

  /** The size table printed with the pattern (finished and body measurements per size), typed in by its owner. */
  @Column('jsonb', { name: 'size_chart', nullable: true })
  sizeChart: SizeChart | null;

  /** Set when a coach published it to the shared library. */
  @Column('timestamptz', { name: 'published_at', nullable: true })
  publishedAt: Date | null;
}
