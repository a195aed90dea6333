import { Column, Entity } from 'typeorm';
import type { FitNote } from '../../../geometry/index.ts';
import { OwnedEntity } from '../../db/owned-entity.ts';

/** One garment in progress: a pattern, a profile, a fabric note and the alteration revisions. */
@Entity({ name: 'makes' })
export class MakeEntity extends OwnedEntity {
  @Column('uuid', { name: 'pattern_id' })
  patternId: string;

  @Column('uuid', { name: 'profile_id', nullable: true })
  profileId: string | null;

  @Column('text', { name: 'fabric_note' })
  fabricNote: string;

  /** The make this one was started from ("sew it again"). */
  @Column('uuid', { name: 'source_make_id', nullable: true })
  sourceMakeId: string | null;

  /** Number of the newest revision; 0 before the first save. Compared and set atomically. */
  @Column('integer', { name: 'latest_revision' })
  latestRevision: number;

  /** One of the owner's kept fabrics, which the fit plan reads. */
  @Column('uuid', { name: 'fabric_id', nullable: true })
  fabricId: string | null;

  /** How the finished garment fit, and what to change next time ("sew it again" reads it). */
  @Column('jsonb', { name: 'fit_note', nullable: true })
  fitNote: (FitNote & { updatedAt: string }) | null;

  @Column('timestamptz', { name: 'archived_at', nullable: true })
  archivedAt: Date | null;
}
