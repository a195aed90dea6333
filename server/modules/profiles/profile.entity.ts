import { Column, Entity } from 'typeorm';
import type { GirthAtHeight } from '../../../geometry/index.ts';
import { OwnedEntity } from '../../db/owned-entity.ts';

/**
 * A person's body measurements (millimetres), kept by a sewist for themself or someone they sew
 * for. The columns hold the current set (the newest by date); every set, dated, is kept in
 * `profile_measurement_sets`.
 */
@Entity({ name: 'profiles' })
export class ProfileEntity extends OwnedEntity {
  @Column('jsonb')
  measurements: Record<string, number>;

  /** Girths at heights above (+) or below (−) the natural waist. */
  @Column('jsonb', { name: 'girths_at_heights' })
  girthsAtHeights: GirthAtHeight[];

  /** The day the current set was taken, `YYYY-MM-DD`. */
  @Column('date', { name: 'taken_on' })
  takenOn: string;
}
