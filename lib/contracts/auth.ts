/** Account requests and answers, shared by the client forms and the server. */
import { z } from 'zod';
import { ROLES, type Role } from './enums';
import { safeText } from './text';

// Spaces a browser, a paste or a phone keyboard can leave around an address: every Unicode space
// and line break (\s covers NBSP, U+3000 and the BOM) plus the zero-width ones \s leaves out.
const EDGE_SPACE = /^[\s\u200B-\u200D\u2060]+|[\s\u200B-\u200D\u2060]+$/g;

/**
 * The one form of an e-mail address: what is stored, compared, looked up and used as a
 * rate-limit key. NFKC first (full-width letters become ASCII, U+3000 a plain space), then
 * the edges trimmed, then lower-cased, so "Ｔech@Shop.example\u00A0" and "tech@shop.example"
 * are one address with one sign-in budget.
 */
export function normalizeEmail(raw: string): string {
  return raw.normalize('NFKC').replace(EDGE_SPACE, '').toLowerCase();
}

export const Email = z
  .string({ error: 'E-mail is required' })
  .overwrite(normalizeEmail)
  .min(3)
  .max(254)
  .email('Enter a valid e-mail address');
/** Length is checked here; the common-password list is checked on the server. */
export const NewPassword = z
  .string({ error: 'Password is required' })
  .min(12, 'Use at least 12 characters')
  .max(200, 'Use at most 200 characters');

export const SignUpBody = z
  .object({
    email: Email,
    displayName: safeText(80, { error: 'Name is required' })
      .min(2, 'Use at least 2 characters')
      .regex(/^[^<>]*$/, 'Angle brackets are not allowed'),
    password: NewPassword,
  })
  .strict();
export type SignUpBody = z.infer<typeof SignUpBody>;

export const SignInBody = z
  .object({ email: Email, password: z.string().min(1, 'Password is required').max(200) })
  .strict();
export type SignInBody = z.infer<typeof SignInBody>;

export const TokenBody = z.object({ token: z.string().trim().min(20).max(200) }).strict();
export const ForgotBody = z.object({ email: Email }).strict();
export const ResetBody = z.object({ token: z.string().trim().min(20).max(200), password: NewPassword }).strict();
export type ResetBody = z.infer<typeof ResetBody>;
export const ChangePasswordBody = z
  .object({ currentPassword: z.string().min(1).max(200), newPassword: NewPassword })
  .strict();
export type ChangePasswordBody = z.infer<typeof ChangePasswordBody>;

/** The roles, least trusted first (lib/contracts/enums.ts ROLES). */
export const ROLE_VALUES = ROLES;
export type RoleValue = Role;

export const UsersQuery = z.object({ q: safeText(120).optional() });
export const UpdateUserBody = z
  .object({
    role: z.enum(ROLE_VALUES).optional(),
    disabled: z.boolean().optional(),
  })
  .strict()
  .refine((b) => b.role !== undefined || b.disabled !== undefined, { message: 'Give a role or disabled.' });

export type UserDto = {
  id: number;
  email: string;
  displayName: string;
  role: RoleValue;
  emailVerified: boolean;
  disabled: boolean;
  createdAt: string;
};
export type SessionDto = { accessToken: string; expiresIn: number; user: UserDto };
export type UserAuditDto = {
  id: number;
  action: string;
  fromValue: string | null;
  toValue: string | null;
  actorName: string;
  createdAt: string;
};
