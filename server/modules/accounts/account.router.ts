import { Router, type CookieOptions, type Request, type Response } from 'express';
import { ChangePasswordBody, ForgotBody, ResetBody, SignInBody, SignUpBody, TokenBody } from '@/lib/contracts/auth';
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
  maxAge: config.REFRESH_TOKEN_TTL_DAYS * 86_400_000,
});

function sendSession(req: Request, res: Response, result: auth.SessionResult) {
  res.cookie(REFRESH_COOKIE, result.refreshToken, cookieOptions(req));
  res.json(result.session);
}

function clearSession(req: Request, res: Response) {
  res
    .clearCookie(REFRESH_COOKIE, { ...cookieOptions(req), maxAge: undefined })
    .status(204)
    .end();
}

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
  await auth.signOut(req.cookies?.[REFRESH_COOKIE]);
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
  const signInLimit = [
    limiter('sign-in', 10, 15 * MINUTE, (req) => String(req.body?.email ?? '').toLowerCase()),
    limiter('sign-in-any', 60, 15 * MINUTE),
  ];
  r.post('/sign-up', limiter('sign-up', 20, 60 * MINUTE), signUp);
  r.post('/verify', limiter('verify', 30, 15 * MINUTE), verify);
  r.post('/sign-in', ...signInLimit, signIn);
  r.post('/refresh', refresh);
  r.post('/sign-out', signOut);
  r.post('/forgot', limiter('forgot', 5, 15 * MINUTE), forgot);
  r.post('/reset', limiter('reset', 10, 15 * MINUTE), reset);
  r.get('/me', me);
  r.post('/password', changePassword);
  r.post('/sign-out-everywhere', signOutEverywhere);
  return r;
}
