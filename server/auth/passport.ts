/**
 * passport-jwt: the bearer token must be HS256, from our issuer for our audience,
 * unexpired and carry an expiry at all; `sub` must be an account id written the one
 * canonical way and `sid` a session id. The account is read on every request together
 * with its session, so a disabled account, a changed role or an ended session (sign-out,
 * sign-out everywhere, a new password) takes effect at once.
 */
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import { findSessionUser } from '../modules/accounts/token.repository';
import { JWT_ALGORITHM, JWT_AUDIENCE, JWT_ISSUER, JWT_KEY } from './tokens';

type Claims = { sub?: unknown; sid?: unknown; exp?: unknown };

// A positive decimal int without sign, leading zeros, exponent or spaces ("1", not "01", "1e0" or " 1").
const CANONICAL_ID = /^[1-9][0-9]{0,9}$/;
const SESSION_ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

/** The account id and session of a well-formed token, or null. */
export function claimsOf(payload: Claims): { userId: number; sessionId: string } | null {
  if (typeof payload.exp !== 'number' || !Number.isFinite(payload.exp)) return null;
  if (typeof payload.sub !== 'string' || !CANONICAL_ID.test(payload.sub)) return null;
  if (typeof payload.sid !== 'string' || !SESSION_ID.test(payload.sid)) return null;
  const userId = Number(payload.sub);
  return userId <= 2_147_483_647 ? { userId, sessionId: payload.sid } : null;
}

passport.use(
  new JwtStrategy(
    {
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // passport-jwt's types say string | Buffer; it hands the key to jsonwebtoken, which takes a KeyObject.
      secretOrKey: JWT_KEY as unknown as Buffer,
      algorithms: [JWT_ALGORITHM],
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
    },
    (payload: Claims, done) => {
      const claims = claimsOf(payload);
      if (!claims) return done(null, false);
      findSessionUser(claims.userId, claims.sessionId)
        .then((user) => {
          if (!user || user.disabledAt || !user.emailVerifiedAt) return done(null, false);
          const { id, email, displayName, role } = user;
          done(null, { id, email, displayName, role, sessionId: claims.sessionId });
        })
        .catch((err) => done(err));
    },
  ),
);

export { passport };
