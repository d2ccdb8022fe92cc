/**
 * passport-jwt: the bearer token must be HS256, from our issuer for our audience, and
 * unexpired; the account is read on every request so a disabled account or a changed
 * role takes effect at once.
 */
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import { config } from '../config';
import { UserRepository } from '../modules/users/user.repository';
import { JWT_ALGORITHM, JWT_AUDIENCE, JWT_ISSUER } from './tokens';

passport.use(
  new JwtStrategy(
    {
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: config.jwtSecret,
      algorithms: [JWT_ALGORITHM],
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
    },
    (payload: { sub?: string }, done) => {
      const id = Number(payload.sub);
      if (!Number.isInteger(id)) return done(null, false);
      UserRepository.findById(id)
        .then((user) => {
          if (!user || user.disabledAt || !user.emailVerifiedAt) return done(null, false);
          done(null, { id: user.id, email: user.email, displayName: user.displayName, role: user.role });
        })
        .catch((err) => done(err));
    },
  ),
);

export { passport };
