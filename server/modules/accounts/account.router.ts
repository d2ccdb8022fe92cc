import { Router, type CookieOptions, type Request, type Response } from 'express';
import { ChangePasswordBody, ForgotBody, ResetBody, SignInBody, SignUpBody, TokenBody } from '@/lib/contracts/auth';
import { config } from '@/server/config';
import { AppError } from '@/server/errors/app-error';
import { validate } from '@/server/middleware/validate';
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

/** Routes that act on the refresh cookie accept only requests from the app's own origin. */
function sameOrigin(req: Request) {
  const origin = req.get('origin');
  if (origin && origin !== config.appUrl && origin !== `${req.protocol}://${req.get('host')}`)
    throw AppError.forbidden('Cross-site request refused.');
}

export function authRouter() {
  const r = Router();
  // Per address (guessing one account's password) and per client (trying many accounts).
  const signInLimit = [
    limiter('sign-in', 10, 15 * MINUTE, (req) => String(req.body?.email ?? '').toLowerCase()),
    limiter('sign-in-any', 60, 15 * MINUTE),
  ];
  r.post('/sign-up', limiter('sign-up', 20, 60 * MINUTE), validate('body', SignUpBody), async (_req, res) => {
    await auth.signUp(res.locals.body);
    res.status(202).json({ message: 'Check your e-mail for a link to confirm the address.' });
  });
  r.post('/verify', limiter('verify', 30, 15 * MINUTE), validate('body', TokenBody), async (_req, res) => {
    res.json({ user: await auth.verifyEmail(res.locals.body.token) });
  });
  r.post('/sign-in', ...signInLimit, validate('body', SignInBody), async (req, res) =>
    sendSession(req, res, await auth.signIn(res.locals.body)),
  );
  r.post('/refresh', async (req, res) => {
    sameOrigin(req);
    sendSession(req, res, await auth.refresh(req.cookies?.[REFRESH_COOKIE]));
  });
  r.post('/sign-out', async (req, res) => {
    sameOrigin(req);
    await auth.signOut(req.cookies?.[REFRESH_COOKIE]);
    res
      .clearCookie(REFRESH_COOKIE, { ...cookieOptions(req), maxAge: undefined })
      .status(204)
      .end();
  });
  r.post('/forgot', limiter('forgot', 5, 15 * MINUTE), validate('body', ForgotBody), async (_req, res) => {
    await auth.forgotPassword(res.locals.body.email);
    res.status(202).json({ message: 'If that address has an account, a reset link is on its way.' });
  });
  r.post('/reset', limiter('reset', 10, 15 * MINUTE), validate('body', ResetBody), async (_req, res) => {
    await auth.resetPassword(res.locals.body);
    res.json({ message: 'Password changed. Sign in with the new password.' });
  });
  r.get('/me', async (req, res) => res.json(await auth.currentUser(req.user!.id)));
  r.post('/password', validate('body', ChangePasswordBody), async (req, res) =>
    sendSession(req, res, await auth.changePassword(req.user!.id, res.locals.body)),
  );
  r.post('/sign-out-everywhere', async (req, res) => {
    await auth.signOutEverywhere(req.user!.id);
    res
      .clearCookie(REFRESH_COOKIE, { ...cookieOptions(req), maxAge: undefined })
      .status(204)
      .end();
  });
  return r;
}
