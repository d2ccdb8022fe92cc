/**
 * Accounts for API tests: a verified user of the given role in this worker's database,
 * and a bearer header signed by the same code the server uses.
 */
import { AppDataSource } from '@/server/db/data-source';
import { signAccessToken } from '@/server/auth/tokens';
import type { Role } from '@/server/auth/roles';
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

export async function authHeader(role: Role, name?: string): Promise<{ Authorization: string }> {
  const user = await testUser(role, name);
  return { Authorization: `Bearer ${signAccessToken(user)}` };
}
