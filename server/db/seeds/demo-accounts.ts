/**
 * One verified demo account per role, created when missing (running again changes
 * nothing). The password comes from DEMO_PASSWORD.
 */
import { config } from '@/server/config';
import { AppDataSource } from '../data-source';
import type { Role } from '@/server/auth/roles';
import { User } from '@/server/modules/users/user.entity';
import { emailKey } from '@/server/modules/users/user.mapper';
import { hashPassword } from '@/server/modules/accounts/passwords';

export const DEMO_ACCOUNTS: { email: string; displayName: string; role: Role }[] = [
  { email: 'admin@specbench.example', displayName: 'Ada Quenby (admin)', role: 'admin' },
  { email: 'editor@specbench.example', displayName: 'Elin Marsh (editor)', role: 'editor' },
  { email: 'contributor@specbench.example', displayName: 'Cato Ruddle (contributor)', role: 'contributor' },
];

export async function ensureDemoAccounts(): Promise<number> {
  const repo = AppDataSource.getRepository(User);
  let created = 0;
  for (const a of DEMO_ACCOUNTS) {
    if (await repo.existsBy({ emailKey: emailKey(a.email) })) continue;
    await repo.insert({
      ...a,
      emailKey: emailKey(a.email),
      passwordHash: await hashPassword(config.DEMO_PASSWORD),
      emailVerifiedAt: new Date(),
    });
    created += 1;
  }
  return created;
}
