import type { Role, Units, UserEntity } from './user.entity.ts';

/** The user as the API shows it: never the password hash. */
export interface UserDto {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  units: Units;
  createdAt: string;
}

export type UserLike = Pick<UserEntity, 'id' | 'email' | 'displayName' | 'role' | 'units' | 'createdAt'>;

export const toUserDto = (u: UserLike): UserDto => ({
  id: u.id,
  email: u.email,
  displayName: u.displayName,
  role: u.role,
  units: u.units,
  createdAt: u.createdAt.toISOString(),
});
