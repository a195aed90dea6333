import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const PRINT_STATUSES = ['queued', 'running', 'done', 'failed'] as const;
export type PrintStatus = (typeof PRINT_STATUSES)[number];

@Entity({ name: 'print_jobs' })
export class PrintJobEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('uuid', { name: 'owner_id' })
  ownerId: string;

  /** The make printed; null for a pattern sent as it is. */
  @Column('uuid', { name: 'make_id', nullable: true })
  makeId: string | null;

  @Column('text')
  status: PrintStatus;

  @Column('integer')
  progress: number;

  @Column('text')
  format: 'pdf' | 'svg';

  @Column('text')
  title: string;

  @Column('jsonb')
  options: Record<string, unknown>;

  @Column('jsonb', { select: false })
  pattern: unknown;

  @Column('bytea', { nullable: true, select: false })
  file: Buffer | null;

  @Column('integer', { name: 'file_size', nullable: true })
  fileSize: number | null;

  @Column('integer', { name: 'page_count', nullable: true })
  pageCount: number | null;

  @Column('jsonb', { name: 'empty_pages', nullable: true })
  emptyPages: string[] | null;

  @Column('text', { nullable: true })
  error: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column('timestamptz', { name: 'finished_at', nullable: true })
  finishedAt: Date | null;
}
