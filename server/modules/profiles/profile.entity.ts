import { Column, Entity } from 'typeorm';
import { OwnedEntity } from '../../db/owned-entity.ts';

/** A person's body measurements (millimetres), kept by a sewist for themself or someone they sew for. */
@Entity({ name: 'profiles' })
export class ProfileEntity extends OwnedEntity {
  @Column('jsonb')
  measurements: Record<string, number>;
}
