import { Passport } from 'passport';

/** This app's own passport instance. */
export type AppPassport = InstanceType<typeof Passport>;
import { Strategy as LocalStrategy } from 'passport-local';
import { AuthService } from './auth.service';

/** A passport instance of this app (not the global one, so tests can run several apps). */
export function createPassport(auth: AuthService): AppPassport {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      auth.verifyCredentials(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: number, done) => {
    auth.loadSessionUser(id).then((user) => done(null, user ?? false), done);
  });
  return passport;
}
