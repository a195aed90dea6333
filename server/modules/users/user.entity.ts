import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export const ROLES = ['sewist', 'coach', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const UNITS = ['in', 'cm'] as const;
/** How lengths are shown to this person: inches with fractions, or centimetres. */
export type Units = (typeof UNITS)[number];

@Entity({ name: 'users' })
export class UserEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stored lower-cased; unique. */
  @Column('text', { unique: true })
  email: string;

  @Column('text', { name: 'display_name' })
  displayName: string;

  @Column('text', { name: 'password_hash' })
  passwordHash: string;

  @Column('text')
  role: Role;

  @Column('text')
  units: Units;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
