import type { MeDto } from '../../shared/schemas/auth';
import type { UserDto } from '../../shared/schemas/users';
import type { User } from './user.entity';

export const toUserDto = (u: User): UserDto => ({
  id: u.id,
  username: u.username,
  displayName: u.displayName,
  email: u.email,
  role: u.role,
  active: u.active,
  mustChangePassword: u.mustChangePassword,
  createdAt: u.createdAt.toISOString(),
});

export const toMeDto = (
  u: Pick<User, 'id' | 'username' | 'displayName' | 'email' | 'role' | 'mustChangePassword'>,
): MeDto => ({
  id: u.id,
  username: u.username,
  displayName: u.displayName,
  email: u.email,
  role: u.role,
  mustChangePassword: u.mustChangePassword,
});
