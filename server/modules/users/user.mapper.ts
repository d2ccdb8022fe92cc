import { normalizeEmail, type UserDto } from '@/lib/contracts/auth';
import type { User } from './user.entity';

export function toUserDto(u: User): UserDto {
  return {
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    role: u.role,
    emailVerified: u.emailVerifiedAt !== null,
    disabled: u.disabledAt !== null,
    createdAt: u.createdAt.toISOString(),
  };
}

/** The unique key of an address (lib/contracts/auth.ts normalizeEmail: NFKC, trimmed, lower-case). */
export const emailKey = normalizeEmail;
