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
import { User } from '../users/user.entity';
import { emailKey, toUserDto } from '../users/user.mapper';
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
    const existing = await m.getRepository(User).findOneBy({ emailKey: emailKey(body.email) });
    if (existing) return enqueue(m, existingAccountMail(existing.email));
    const user = await m.getRepository(User).save({
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
    await m.getRepository(User).update({ id: userId }, { emailVerifiedAt: new Date() });
    return toUserDto(await m.getRepository(User).findOneByOrFail({ id: userId }));
  });
}

export async function signIn(body: SignInBody): Promise<SessionResult> {
  const user = await AppDataSource.getRepository(User).findOneBy({ emailKey: emailKey(body.email) });
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
  const user = await AppDataSource.getRepository(User).findOneBy({ id: rotation.userId });
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
    const user = await m.getRepository(User).findOneBy({ emailKey: emailKey(email) });
    if (!user || user.disabledAt) return;
    await enqueue(m, resetMail(user.email, user.displayName, await createLink(m, user.id, 'reset')));
  });
}

export async function resetPassword(body: ResetBody): Promise<void> {
  const passwordHash = await hashPassword(body.password);
  await AppDataSource.transaction(async (m) => {
    const userId = await consumeLink(m, body.token, 'reset');
    const user = await m.getRepository(User).findOneByOrFail({ id: userId });
    checkPasswordStrength(body.password, user.email);
    // The link proves the address, so it also counts as verification.
    await m
      .getRepository(User)
      .update({ id: userId }, { passwordHash, emailVerifiedAt: user.emailVerifiedAt ?? new Date() });
    await revokeAllFor(m, userId);
  });
}

export async function changePassword(userId: number, body: ChangePasswordBody): Promise<SessionResult> {
  const user = await AppDataSource.getRepository(User).findOneByOrFail({ id: userId });
  if (!(await verifyPassword(body.currentPassword, user.passwordHash))) {
    throw AppError.unprocessable('The current password is wrong.', [
      { path: 'currentPassword', message: 'Wrong password' },
    ]);
  }
  checkPasswordStrength(body.newPassword, user.email);
  const passwordHash = await hashPassword(body.newPassword);
  const token = await AppDataSource.transaction(async (m) => {
    await m.getRepository(User).update({ id: userId }, { passwordHash });
    await revokeAllFor(m, userId);
    return issueRefreshToken(m, userId);
  });
  return session(user, token);
}

export async function signOutEverywhere(userId: number): Promise<void> {
  await AppDataSource.transaction((m) => revokeAllFor(m, userId));
}

export async function currentUser(userId: number): Promise<UserDto> {
  return toUserDto(await AppDataSource.getRepository(User).findOneByOrFail({ id: userId }));
}
