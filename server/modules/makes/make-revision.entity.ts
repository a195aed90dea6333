import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { AlterationEntry } from '../../../geometry/index.ts';

/** One saved state of a make's alteration list. Append-only (a database trigger refuses updates). */
@Entity({ name: 'make_revisions' })
export class MakeRevisionEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('uuid', { name: 'make_id' })
  makeId: string;

  /** 1, 2, 3, … within the make. */
  @Column('integer')
  number: number;

  @Column('jsonb')
  alterations: AlterationEntry[];

  /** One line on what changed, e.g. "shortened lower leg by 3 in". */
  @Column('text')
  summary: string;

  @Column('uuid', { name: 'author_id', nullable: true })
  authorId: string | null;

  /** When this revision restored an earlier one: that revision's number. */
  @Column('integer', { name: 'restored_from', nullable: true })
  restoredFrom: number | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
