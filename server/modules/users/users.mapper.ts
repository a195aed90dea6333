import type { Role, UserEntity } from './user.entity.ts';

/** The user as the API shows it: never the password hash. */
export interface UserDto {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  createdAt: string;
}

export type UserLike = Pick<UserEntity, 'id' | 'email' | 'displayName' | 'role' | 'createdAt'>;

export const toUserDto = (u: UserLike): UserDto => ({
  id: u.id,
  email: u.email,
  displayName: u.displayName,
  role: u.role,
  createdAt: u.createdAt.toISOString(),
});
