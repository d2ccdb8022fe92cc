import { Router, type CookieOptions, type Request, type Response } from 'express';
import {
  ChangePasswordBody,
  ForgotBody,
  normalizeEmail,
  ResetBody,
  SignInBody,
  SignUpBody,
  TokenBody,
} from '@/lib/contracts/auth';
import { config } from '@/server/config';
import { AppError } from '@/server/errors/app-error';
import { route } from '@/server/http/handler';
import { limiter } from '@/server/middleware/rate-limit';
import * as auth from './account.service';

export const REFRESH_COOKIE = 'sb_refresh';
const MINUTE = 60_000;

const cookieOptions = (req: Request): CookieOptions => ({
  httpOnly: true,
  sameSite: 'strict',
  secure: config.NODE_ENV === 'production' || req.secure,
  path: '/api/auth',
});

/** The cookie lives exactly as long as its session: until the absolute end set at sign-in. */
function sendSession(req: Request, res: Response, result: auth.SessionResult) {
  const maxAge = Math.max(0, result.refreshExpiresAt.getTime() - Date.now());
  res.cookie(REFRESH_COOKIE, result.refreshToken, { ...cookieOptions(req), maxAge });
  res.json(result.session);
}

function clearSession(req: Request, res: Response) {
  res.clearCookie(REFRESH_COOKIE, cookieOptions(req)).status(204).end();
}

/** The typed address in its one normal form (lib/contracts/auth.ts), so " A@x" and "a@x" share a budget. */
const addressOf = (req: Request) => normalizeEmail(typeof req.body?.email === 'string' ? req.body.email : '');
const accountOf = (req: Request) => String(req.user?.id ?? '');

/** Routes that act on the refresh cookie accept only requests from the app's own origin. */
function sameOrigin(req: Request) {
  const origin = req.get('origin');
  if (origin && origin !== config.appUrl && origin !== `${req.protocol}://${req.get('host')}`)
    throw AppError.forbidden('Cross-site request refused.');
}

const signUp = route({ body: SignUpBody, status: 202 }, async ({ body }) => {
  await auth.signUp(body);
  return { message: 'Check your e-mail for a link to confirm the address.' };
});
const verify = route({ body: TokenBody }, async ({ body }) => ({ user: await auth.verifyEmail(body.token) }));
const signIn = route({ body: SignInBody }, async ({ body, req, res }) =>
  sendSession(req, res, await auth.signIn(body)),
);
const refresh = route({}, async ({ req, res }) => {
  sameOrigin(req);
  sendSession(req, res, await auth.refresh(req.cookies?.[REFRESH_COOKIE]));
});
const signOut = route({}, async ({ req, res }) => {
  sameOrigin(req);
  await auth.signOut(req.cookies?.[REFRESH_COOKIE], req.user?.sessionId);
  clearSession(req, res);
});
const forgot = route({ body: ForgotBody, status: 202 }, async ({ body }) => {
  await auth.forgotPassword(body.email);
  return { message: 'If that address has an account, a reset link is on its way.' };
});
const reset = route({ body: ResetBody }, async ({ body }) => {
  await auth.resetPassword(body);
  return { message: 'Password changed. Sign in with the new password.' };
});
const me = route({}, ({ user }) => auth.currentUser(user.id));
const changePassword = route({ body: ChangePasswordBody }, async ({ body, user, req, res }) =>
  sendSession(req, res, await auth.changePassword(user.id, body)),
);
const signOutEverywhere = route({}, async ({ user, req, res }) => {
  await auth.signOutEverywhere(user.id);
  clearSession(req, res);
});

export function authRouter() {
  const r = Router();
  // Per address (guessing one account's password) and per client (trying many accounts).
  const signInLimit = [limiter('sign-in', 10, 15 * MINUTE, addressOf), limiter('sign-in-any', 60, 15 * MINUTE)];
  // Per client, and per inbox from any client: one address cannot be flooded with reset mail.
  const forgotLimit = [
    limiter('forgot', 5, 15 * MINUTE),
    limiter('forgot-address', 3, 60 * MINUTE, addressOf, { acrossClients: true }),
  ];
  // Per account, from any client: a stolen access token cannot guess the current password.
  const passwordLimit = limiter('password', 5, 15 * MINUTE, accountOf, { acrossClients: true });
  r.post('/sign-up', limiter('sign-up', 20, 60 * MINUTE), signUp);
  r.post('/verify', limiter('verify', 30, 15 * MINUTE), verify);
  r.post('/sign-in', ...signInLimit, signIn);
  r.post('/refresh', refresh);
  r.post('/sign-out', signOut);
  r.post('/forgot', ...forgotLimit, forgot);
  r.post('/reset', limiter('reset', 10, 15 * MINUTE), reset);
  r.get('/me', me);
  r.post('/password', passwordLimit, changePassword);
  r.post('/sign-out-everywhere', signOutEverywhere);
  return r;
}
