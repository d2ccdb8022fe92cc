import { ROLES, type Role } from '@/lib/contracts/enums';

/** Roles, from least to most trusted (lib/contracts/enums.ts); each may do everything the ones before it may. */
export { ROLES, type Role };

/** Who may call a route: anyone, any signed-in account, or at least the named role. */
export type AccessRule = 'public' | 'signed-in' | Role;

export type SignedInUser = {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  /** The session the access token belongs to (set by passport.ts on every request). */
  sessionId?: string;
};

export function roleAtLeast(role: Role, needed: Role): boolean {
  return ROLES.indexOf(role) >= ROLES.indexOf(needed);
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport sets req.user to the signed-in account.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type -- declaration merging needs an interface
    interface User extends SignedInUser {}
  }
}
