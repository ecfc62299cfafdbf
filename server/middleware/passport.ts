import { Passport, type PassportStatic } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { presentUser } from '../presenters/user.presenter';
import { findActiveUser, verifyCredentials } from '../services/auth.service';

/**
 * passport-local on e-mail and password; the session keeps only the user id. One Passport instance
 * per app, not the package's singleton, so two apps (tests) never share strategies.
 */
export function configurePassport(ds: DataSource): PassportStatic {
  const passport = new Passport() as PassportStatic;
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', session: true }, (email, password, done) => {
      verifyCredentials(ds, email, password)
        .then((user) => done(null, user ? presentUser(user) : false))
        .catch((err: unknown) => done(err));
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  // A disabled or deleted user's session ends at its next request.
  passport.deserializeUser((id: string, done) => {
    findActiveUser(ds, id)
      .then((user) => done(null, user ? presentUser(user) : false))
      .catch((err: unknown) => done(err));
  });
  return passport;
}
