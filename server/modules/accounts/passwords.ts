/**
 * Password policy and hashing: at least 12 characters (checked by the shared schema),
 * not one of the commonest passwords, not the e-mail address; bcryptjs hashes.
 */
import bcrypt from 'bcryptjs';
import { normalizeEmail } from '@/lib/contracts/auth';
import { config } from '@/server/config';
import { AppError } from '@/server/errors/app-error';

// A short list of the passwords (and patterns) most often seen in breach corpora, 12+ characters.
const COMMON = new Set([
  'password1234',
  '123456789012',
  '1234567890123',
  'qwertyuiop12',
  'qwertyuiopasdf',
  'iloveyou1234',
  'passwordpassword',
  'password12345',
  'password123456',
  'administrator',
  'letmein12345',
  'welcome12345',
  'abc123456789',
  '111111111111',
  '000000000000',
  'aaaaaaaaaaaa',
  'qwerty123456',
  '1q2w3e4r5t6y',
  'football1234',
  'baseball1234',
  'sunshine1234',
  'princess1234',
  'trustno11234',
  'changeme1234',
  'specbench123',
  'specbench1234',
  'motorcycle123',
  'qazwsxedcrfv',
]);

export function checkPasswordStrength(password: string, email: string) {
  const lower = password.toLowerCase();
  const name = normalizeEmail(email).split('@')[0];
  if (COMMON.has(lower) || /^(.)\1+$/.test(password) || /^(0123456789|1234567890)+\d*$/.test(password)) {
    throw AppError.unprocessable('That password is too common. Choose a longer phrase nobody would guess.', [
      { path: 'password', message: 'Too common' },
    ]);
  }
  if (name.length >= 4 && lower.includes(name)) {
    throw AppError.unprocessable('The password must not contain your e-mail name.', [
      { path: 'password', message: 'Contains your e-mail name' },
    ]);
  }
}

export const hashPassword = (password: string) => bcrypt.hash(password, config.BCRYPT_COST);
export const verifyPassword = (password: string, hash: string) => bcrypt.compare(password, hash);
/** A hash made at another cost than the configured one is replaced at the next sign-in. */
export const needsRehash = (hash: string) => bcrypt.getRounds(hash) !== config.BCRYPT_COST;

/**
 * Compared against when the e-mail is unknown, so timing does not reveal which accounts
 * exist: it has the configured cost, as every real hash has (a cheaper dummy answered
 * unknown addresses in half the time). Made at start-up, off the event loop's critical path.
 */
let dummyHash: Promise<string> | null = null;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= bcrypt.hash('not-a-real-password-at-all', config.BCRYPT_COST);
  return dummyHash;
}
void dummyPasswordHash();
