import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { UsersService } from '../users/users.service.ts';

/** A passport instance of the app's own (not the module-wide one), so several apps can share a process. */
export function createPassport(users: UsersService): passport.Authenticator {
  const instance = new passport.Passport();
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      users.verify(email, password).then(
        (user) => done(null, user ?? false),
        (err: unknown) => done(err),
      );
    }),
  );
  instance.serializeUser((user, done) => done(null, user.id));
  instance.deserializeUser((id: string, done) => {
    users.findById(id).then(
      (user) => done(null, user ?? false),
      (err: unknown) => done(err),
    );
  });
  return instance;
}
