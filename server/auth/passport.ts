import { Passport } from 'passport';

export type PassportInstance = InstanceType<typeof Passport>;
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../models';
import { writeTransaction } from '../db/write-transaction';
import { normaliseEmail } from '../../shared/domain/email';
import { checkPassword, hashPassword, needsRehash } from './password';
import { UserCache } from './user-cache';

/**
 * A passport instance of its own per app, so tests can run several apps in one process.
 * `passwordCost` is the scrypt cost new hashes get (config `PASSWORD_COST`).
 */
export function createPassport(passwordCost: number): PassportInstance {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email' }, (email, password, done) => {
      verify(email, password, passwordCost).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, (user as User).id));
  const users = new UserCache();
  passport.deserializeUser((id: number, done) => {
    users.find(id).then((user) => done(null, user?.active ? user : false), done);
  });
  return passport;
}

async function verify(email: string, password: string, cost: number): Promise<User | null> {
  const user = await User.findOne({ where: { email: normaliseEmail(email) } });
  const matches = await checkPassword(password, user?.passwordHash, cost);
  if (!user || !user.active || !matches) return null;
  if (needsRehash(user.passwordHash, cost)) await upgradeHash(user, password, cost);
  return user;
}

/** A bcrypt hash (or one of older scrypt settings) becomes a current one at sign-in. */
async function upgradeHash(user: User, password: string, cost: number): Promise<void> {
  const passwordHash = await hashPassword(password, cost);
  await writeTransaction(User.sequelize!, (transaction) =>
    user.update({ passwordHash }, { transaction }),
  );
}
