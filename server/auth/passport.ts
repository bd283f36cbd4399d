import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../models/user';
import { verifyPassword } from './passwords';

/** The strategy's note when the password is right but a site admin turned the account off. */
export const DISABLED_REFUSAL = 'account-disabled';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // The signed-in person on req.user is the User model.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends InstanceType<typeof import('../models/user').User> {}
  }
}

passport.use(
  new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
    User.findOne({ where: { email: email.trim().toLowerCase() } })
      .then(async (user) => {
        const ok = await verifyPassword(user?.passwordHash, password);
        if (!ok || !user) return done(null, false);
        // Only someone who knows the password learns that the account is turned off; a wrong password says nothing more.
        if (user.disabledAt) return done(null, false, { message: DISABLED_REFUSAL });
        done(null, user);
      })
      .catch(done);
  }),
);

// The session holds only the user's id; the row is read again on each request so role changes apply at once.
passport.serializeUser((user, done) => done(null, (user as User).id));
passport.deserializeUser((id: number, done) => {
  User.findByPk(id)
    .then((user) => done(null, user && !user.disabledAt ? user : false)) // disabling ends every session at once
    .catch(done);
});

export { passport };
