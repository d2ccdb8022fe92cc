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
import { checkPasswordStrength, dummyPasswordHash, hashPassword, needsRehash, verifyPassword } from './passwords';
import {
  revokeAllFor,
  revokeSession,
  rotateRefreshToken,
  sessionOf,
  startSession,
  type IssuedToken,
} from './session-tokens';

/** The answer's body and the refresh token (with its session's end) for the cookie. */
export type SessionResult = { session: SessionDto; refreshToken: string; refreshExpiresAt: Date };

const session = (user: User, issued: IssuedToken): SessionResult => ({
  session: {
    accessToken: signAccessToken(user, issued.sessionId),
    expiresIn: config.ACCESS_TOKEN_TTL_S,
    user: toUserDto(user),
  },
  refreshToken: issued.token,
  refreshExpiresAt: issued.expiresAt,
});

export async function signUp(body: SignUpBody): Promise<void> {
  checkPasswordStrength(body.password, body.email);
  const passwordHash = await hashPassword(body.password);
  await AppDataSource.transaction(async (m) => {
    const existing = await m.withRepository(UserRepository).findByEmail(body.email);
    if (existing) return enqueue(m, existingAccountMail(existing.email));
    const user = await m.withRepository(UserRepository).save({
      email: body.email,
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
  // An unknown address costs one hash of the configured cost too (passwords.ts), so both take as long.
  const ok = await verifyPassword(body.password, user?.passwordHash ?? (await dummyPasswordHash()));
  if (!user || !ok) throw new AppError(401, 'invalid_credentials', 'The e-mail address or the password is wrong.');
  if (user.disabledAt)
    throw new AppError(403, 'account_disabled', 'This account has been disabled. Ask an administrator.');
  if (!user.emailVerifiedAt)
    throw new AppError(403, 'email_not_verified', 'Confirm your e-mail address first: follow the link we sent you.');
  if (needsRehash(user.passwordHash)) {
    await UserRepository.update({ id: user.id }, { passwordHash: await hashPassword(body.password) });
  }
  return session(user, await AppDataSource.transaction((m) => startSession(m, user.id)));
}

export async function refresh(token: string | undefined): Promise<SessionResult> {
  if (!token) throw new AppError(401, 'session_ended', 'You are not signed in.');
  const rotation = await AppDataSource.transaction((m) => rotateRefreshToken(m, token));
  if (!rotation.ok) throw rotation.error;
  const user = await UserRepository.findById(rotation.userId);
  if (!user || user.disabledAt)
    throw new AppError(403, 'account_disabled', 'This account has been disabled. Ask an administrator.');
  return session(user, rotation.issued);
}

/** Ends the cookie's session, and the bearer token's when one came with the request. */
export async function signOut(token: string | undefined, bearerSessionId?: string): Promise<void> {
  if (!token && !bearerSessionId) return;
  await AppDataSource.transaction(async (m) => {
    const sessionId = token ? await sessionOf(m, token) : null;
    for (const id of new Set([sessionId, bearerSessionId])) if (id) await revokeSession(m, id);
  });
}

/**
 * Every forgot-password answer takes this long at least: a known address writes a link and
 * a message, an unknown one writes nothing, and the difference must not show in the timing.
 * common practice, no published source: a floor well above the work (a few ms here).
 */
export const FORGOT_MIN_MS = 250;

export async function forgotPassword(email: string): Promise<void> {
  const floor = new Promise((resolve) => setTimeout(resolve, FORGOT_MIN_MS));
  try {
    await AppDataSource.transaction(async (m) => {
      const user = await m.withRepository(UserRepository).findByEmail(email);
      if (!user || user.disabledAt) return;
      await enqueue(m, resetMail(user.email, user.displayName, await createLink(m, user.id, 'reset')));
    });
  } finally {
    await floor;
  }
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
    return startSession(m, userId);
  });
  return session(user, token);
}

export async function signOutEverywhere(userId: number): Promise<void> {
  await AppDataSource.transaction((m) => revokeAllFor(m, userId));
}

export async function currentUser(userId: number): Promise<UserDto> {
  return toUserDto(await UserRepository.getById(userId));
}
