import { Column, Entity } from 'typeorm';
import { OwnedEntity } from '../../db/owned-entity.ts';

/** A cloth a sewist keeps a record of; `properties` is geometry/fit's fabric shape (lengths in mm). */
@Entity({ name: 'fabrics' })
export class FabricEntity extends OwnedEntity {
  @Column('jsonb')
  properties: Record<string, unknown>;
}
