/** Single-use e-mail links: create (hashed), consume (once, before expiry), and the messages. */
import type { EntityManager } from 'typeorm';
import { config } from '@/server/config';
import { AppError } from '@/server/errors/app-error';
import { randomToken, sha256Hex } from '@/server/auth/tokens';
import { EmailTokenRepository } from './token.repository';

const TTL_MS = { verify: 24 * 3_600_000, reset: 30 * 60_000 } as const;

export async function createLink(m: EntityManager, userId: number, purpose: 'verify' | 'reset'): Promise<string> {
  const token = randomToken();
  await m
    .withRepository(EmailTokenRepository)
    .insert({ userId, purpose, tokenHash: sha256Hex(token), expiresAt: new Date(Date.now() + TTL_MS[purpose]) });
  const page = purpose === 'verify' ? 'verify' : 'reset';
  return `${config.appUrl}/${page}?token=${encodeURIComponent(token)}`;
}

/** Marks the link used and returns its user; a used, expired or unknown link is refused. */
export async function consumeLink(m: EntityManager, token: string, purpose: 'verify' | 'reset'): Promise<number> {
  const repo = m.withRepository(EmailTokenRepository);
  const row = await repo.lockByHash(sha256Hex(token), purpose);
  const what = purpose === 'verify' ? 'verification' : 'password reset';
  if (!row) throw new AppError(400, 'invalid_token', `This ${what} link is not valid. Ask for a new one.`);
  if (row.usedAt) throw new AppError(400, 'token_used', `This ${what} link has already been used. Ask for a new one.`);
  if (row.expiresAt.getTime() <= Date.now())
    throw new AppError(400, 'token_expired', `This ${what} link has expired. Ask for a new one.`);
  await repo.markUsed(row.id);
  // Older links of the same kind stop working too.
  await repo.useUpAll(row.userId, purpose);
  return row.userId;
}

export const verifyMail = (to: string, name: string, link: string) => ({
  to,
  subject: 'Confirm your Specbench e-mail address',
  text: `Hello ${name},\n\nConfirm your e-mail address to finish setting up your Specbench account:\n\n${link}\n\nThe link works once and expires in 24 hours. If you did not sign up, ignore this message.\n`,
});

export const resetMail = (to: string, name: string, link: string) => ({
  to,
  subject: 'Reset your Specbench password',
  text: `Hello ${name},\n\nSomeone (hopefully you) asked to reset the password of this Specbench account. Choose a new password here:\n\n${link}\n\nThe link works once and expires in 30 minutes. If you did not ask, ignore this message: your password stays as it is.\n`,
});

export const existingAccountMail = (to: string) => ({
  to,
  subject: 'Sign-up attempt with your Specbench address',
  text: `Someone tried to create a Specbench account with this e-mail address, which already has one.\nIf it was you, sign in instead, or use "Forgot password" at ${config.appUrl}/forgot.\n`,
});
