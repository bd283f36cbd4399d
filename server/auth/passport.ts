import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../models/user';
import { verifyPassword } from './passwords';

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
        // A disabled account is refused like a wrong password: the message never tells who has an account.
        done(null, ok && user && !user.disabledAt ? user : false);
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
