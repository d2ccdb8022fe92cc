/**
 * Accounts: sign up with e-mail verification, sign in, refresh, sign out, forgotten
 * and changed passwords. Answers that could reveal whether an address has an account
 * (sign-up, forgot) are the same either way.
 */
import type { ChangePasswordBody, ResetBody, SessionDto, SignInBody, SignUpBody, UserDto } from '@/lib/contracts/auth';
import { config } from '@/server/config';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { signAccessToken } from '@/server/auth/tokens';
import { enqueue } from '../mail/mailer';
import type { User } from '../users/user.entity';
import { emailKey, toUserDto } from '../users/user.mapper';
import { UserRepository } from '../users/user.repository';
import { consumeLink, createLink, existingAccountMail, resetMail, verifyMail } from './email-links';
import { checkPasswordStrength, DUMMY_HASH, hashPassword, verifyPassword } from './passwords';
import { familyOf, issueRefreshToken, revokeAllFor, revokeFamily, rotateRefreshToken } from './session-tokens';

export type SessionResult = { session: SessionDto; refreshToken: string };

const session = (user: User, refreshToken: string): SessionResult => ({
  session: { accessToken: signAccessToken(user), expiresIn: config.ACCESS_TOKEN_TTL_S, user: toUserDto(user) },
  refreshToken,
});

export async function signUp(body: SignUpBody): Promise<void> {
  checkPasswordStrength(body.password, body.email);
  const passwordHash = await hashPassword(body.password);
  await AppDataSource.transaction(async (m) => {
    const existing = await m.withRepository(UserRepository).findByEmail(body.email);
    if (existing) return enqueue(m, existingAccountMail(existing.email));
    const user = await m.withRepository(UserRepository).save({
      email: body.email.trim(),
      emailKey: emailKey(body.email),
      displayName: body.displayName,
      passwordHash,
      role: 'contributor',
    });
    await enqueue(m, verifyMail(user.email, user.displayName, await createLink(m, user.id, 'verify')));
  });
}

export async function verifyEmail(token: string): Promise<UserDto> {
  return AppDataSource.transaction(async (m) => {
    const userId = await consumeLink(m, token, 'verify');
    const users = m.withRepository(UserRepository);
    await users.update({ id: userId }, { emailVerifiedAt: new Date() });
    return toUserDto(await users.getById(userId));
  });
}

export async function signIn(body: SignInBody): Promise<SessionResult> {
  const user = await UserRepository.findByEmail(body.email);
  const ok = await verifyPassword(body.password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !ok) throw new AppError(401, 'invalid_credentials', 'The e-mail address or the password is wrong.');
  if (user.disabledAt)
    throw new AppError(403, 'account_disabled', 'This account has been disabled. Ask an administrator.');
  if (!user.emailVerifiedAt)
    throw new AppError(403, 'email_not_verified', 'Confirm your e-mail address first: follow the link we sent you.');
  return session(user, await AppDataSource.transaction((m) => issueRefreshToken(m, user.id)));
}

export async function refresh(token: string | undefined): Promise<SessionResult> {
  if (!token) throw new AppError(401, 'session_ended', 'You are not signed in.');
  const rotation = await AppDataSource.transaction((m) => rotateRefreshToken(m, token));
  if (!rotation.ok) throw rotation.error;
  const user = await UserRepository.findById(rotation.userId);
  if (!user || user.disabledAt)
    throw new AppError(403, 'account_disabled', 'This account has been disabled. Ask an administrator.');
  return session(user, rotation.token);
}

export async function signOut(token: string | undefined): Promise<void> {
  if (!token) return;
  await AppDataSource.transaction(async (m) => {
    const family = await familyOf(m, token);
    if (family) await revokeFamily(m, family);
  });
}

export async function forgotPassword(email: string): Promise<void> {
  await AppDataSource.transaction(async (m) => {
    const user = await m.withRepository(UserRepository).findByEmail(email);
    if (!user || user.disabledAt) return;
    await enqueue(m, resetMail(user.email, user.displayName, await createLink(m, user.id, 'reset')));
  });
}

export async function resetPassword(body: ResetBody): Promise<void> {
  const passwordHash = await hashPassword(body.password);
  await AppDataSource.transaction(async (m) => {
    const userId = await consumeLink(m, body.token, 'reset');
    const users = m.withRepository(UserRepository);
    const user = await users.getById(userId);
    checkPasswordStrength(body.password, user.email);
    // The link proves the address, so it also counts as verification.
    await users.update({ id: userId }, { passwordHash, emailVerifiedAt: user.emailVerifiedAt ?? new Date() });
    await revokeAllFor(m, userId);
  });
}

export async function changePassword(userId: number, body: ChangePasswordBody): Promise<SessionResult> {
  const user = await UserRepository.getById(userId);
  if (!(await verifyPassword(body.currentPassword, user.passwordHash))) {
    throw AppError.unprocessable('The current password is wrong.', [
      { path: 'currentPassword', message: 'Wrong password' },
    ]);
  }
  checkPasswordStrength(body.newPassword, user.email);
  const passwordHash = await hashPassword(body.newPassword);
  const token = await AppDataSource.transaction(async (m) => {
    await m.withRepository(UserRepository).update({ id: userId }, { passwordHash });
    await revokeAllFor(m, userId);
    return issueRefreshToken(m, userId);
  });
  return session(user, token);
}

export async function signOutEverywhere(userId: number): Promise<void> {
  await AppDataSource.transaction((m) => revokeAllFor(m, userId));
}

export async function currentUser(userId: number): Promise<UserDto> {
  return toUserDto(await UserRepository.getById(userId));
}
