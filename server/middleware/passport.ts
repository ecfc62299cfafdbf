import { Passport, type PassportStatic } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { presentUser } from '../presenters/user.presenter';
import { findActiveUser, verifyCredentials } from '../services/auth.service';

const USER_CACHE_MS = 2_000;

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
  // A disabled or deleted user's session ends at its next request (disabling also deletes the
  // sessions at once). The lookup is kept for two seconds, so a clerk typing into the search box
  // costs one user query per pause, not one per keystroke.
  const recent = new Map<string, { at: number; user: Express.User | false }>();
  passport.deserializeUser((id: string, done) => {
    const hit = recent.get(id);
    if (hit && Date.now() - hit.at < USER_CACHE_MS) return done(null, hit.user);
    findActiveUser(ds, id)
      .then((user) => {
        const presented = user ? presentUser(user) : false;
        if (recent.size > 1000) recent.clear();
        recent.set(id, { at: Date.now(), user: presented });
        done(null, presented);
      })
      .catch((err: unknown) => done(err));
  });
  return passport;
}
