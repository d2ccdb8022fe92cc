/** Admin work on accounts: list and search, change a role, disable or enable — each change recorded. */
import { z } from 'zod';
import type { UpdateUserBody, UserAuditDto, UserDto } from '@/lib/contracts/auth';
import { writeTransaction } from '@/server/db/deadlock-retry';
import { AppError } from '@/server/errors/app-error';
import type { Actor } from '@/server/auth/actor';
import { revokeAllFor } from '../accounts/session-tokens';
import { toUserDto } from './user.mapper';
import { UserAuditRepository, UserRepository } from './user.repository';

export async function listUsers(q?: string): Promise<UserDto[]> {
  return (await UserRepository.search(q)).map(toUserDto);
}

export async function updateUser(id: number, body: z.infer<typeof UpdateUserBody>, actor: Actor): Promise<UserDto> {
  return writeTransaction(async (m) => {
    const users = m.withRepository(UserRepository);
    const user = await users.lockById(id);
    if (!user) throw AppError.notFound('user', id);
    if (user.id === actor.id && ((body.role !== undefined && body.role !== 'admin') || body.disabled)) {
      throw AppError.unprocessable('You cannot demote or disable your own account; ask another admin.');
    }
    const audit = (action: string, fromValue: string | null, toValue: string | null) =>
      m
        .withRepository(UserAuditRepository)
        .record({ userId: id, actorId: actor.id, actorName: actor.name, action, fromValue, toValue });
    if (body.role !== undefined && body.role !== user.role) {
      await audit('role_changed', user.role, body.role);
      user.role = body.role;
    }
    if (body.disabled !== undefined && body.disabled !== (user.disabledAt !== null)) {
      await audit(body.disabled ? 'disabled' : 'enabled', null, null);
      user.disabledAt = body.disabled ? new Date() : null;
      if (body.disabled) await revokeAllFor(m, id);
    }
    return toUserDto(await users.save(user));
  });
}

export async function userAudit(id: number): Promise<UserAuditDto[]> {
  const rows = await UserAuditRepository.latestFor(id);
  return rows.map((r) => ({
    id: r.id,
    action: r.action,
    fromValue: r.fromValue,
    toValue: r.toValue,
    actorName: r.actorName,
    createdAt: r.createdAt.toISOString(),
  }));
}
