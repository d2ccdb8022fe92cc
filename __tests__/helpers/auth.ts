/**
 * Accounts for API tests: a verified user of the given role in this worker's database,
 * and a bearer header for a real session of it (a refresh-token family in the database,
 * its id as the token's `sid`), signed by the same code the server uses. Each header is a
 * session of its own, so a test that signs one out leaves the others working.
 */
import { AppDataSource } from '@/server/db/data-source';
import { signAccessToken } from '@/server/auth/tokens';
import type { Role } from '@/server/auth/roles';
import { hashPassword } from '@/server/modules/accounts/passwords';
import { startSession } from '@/server/modules/accounts/session-tokens';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';

// bcrypt hash of 'not used: tests sign tokens directly' (cost 10); never used to sign in.
const UNUSED_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.cQ6Fq6y0GzZl3fQ9n3x0w8y8pS7e';

export async function testUser(role: Role, name = `${role}-tester`): Promise<User> {
  const email = `${name}@test.specbench.example`;
  const repo = AppDataSource.getRepository(User);
  const found = await repo.findOneBy({ emailKey: emailKey(email) });
  if (found) return found;
  return repo.save({
    email,
    emailKey: emailKey(email),
    displayName: `Test ${name}`,
    passwordHash: UNUSED_HASH,
    role,
    emailVerifiedAt: new Date(),
  });
}

/** A new signed-in session of the account: its access token, refresh token and session id. */
export async function sessionFor(user: Pick<User, 'id' | 'role'>) {
  const issued = await AppDataSource.transaction((m) => startSession(m, user.id));
  return { accessToken: signAccessToken(user, issued.sessionId), refreshToken: issued.token, sid: issued.sessionId };
}

/** `Authorization: Bearer …` for a new session of the account. */
export async function bearerFor(user: Pick<User, 'id' | 'role'>): Promise<{ Authorization: string }> {
  return { Authorization: `Bearer ${(await sessionFor(user)).accessToken}` };
}

export async function authHeader(role: Role, name?: string): Promise<{ Authorization: string }> {
  return bearerFor(await testUser(role, name));
}

let seq = 0;
/** A verified account that signs in with `password` through the API (a real hash of the configured cost). */
export async function accountWithPassword(password: string, role: Role = 'contributor'): Promise<User> {
  const email = `pw-${Date.now()}-${(seq += 1)}@test.specbench.example`;
  return AppDataSource.getRepository(User).save({
    email,
    emailKey: emailKey(email),
    displayName: 'Test Password Holder',
    passwordHash: await hashPassword(password),
    role,
    emailVerifiedAt: new Date(),
  });
}
