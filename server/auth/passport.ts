import { Passport } from 'passport';

export type PassportInstance = InstanceType<typeof Passport>;
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../models';
import { checkPassword } from './password';
import { UserCache } from './user-cache';

/** A passport instance of its own per app, so tests can run several apps in one process. */
export function createPassport(): PassportInstance {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email' }, (email, password, done) => {
      verify(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, (user as User).id));
  const users = new UserCache();
  passport.deserializeUser((id: number, done) => {
    users.find(id).then((user) => done(null, user?.active ? user : false), done);
  });
  return passport;
}

async function verify(email: string, password: string): Promise<User | null> {
  const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
  const matches = await checkPassword(password, user?.passwordHash);
  return user && user.active && matches ? user : null;
}
