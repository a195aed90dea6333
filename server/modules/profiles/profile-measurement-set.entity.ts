import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { GirthAtHeight } from '../../../geometry/index.ts';

/** One dated set of a profile's measurements (mm). Append-only: a database trigger refuses updates. */
@Entity({ name: 'profile_measurement_sets' })
export class ProfileMeasurementSetEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column('uuid', { name: 'profile_id' })
  profileId: string;

  /** The day the measurements were taken, `YYYY-MM-DD`. */
  @Column('date', { name: 'taken_on' })
  takenOn: string;

  @Column('jsonb')
  measurements: Record<string, number>;

  @Column('jsonb', { name: 'girths_at_heights' })
  girthsAtHeights: GirthAtHeight[];

  @Column('text')
  note: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
