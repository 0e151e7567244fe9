import { Passport, type PassportStatic } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Knex } from 'knex';
import { toPublicUser, usersRepository } from '../users/users.repository';
import { hashPassword, verifyPassword } from './password';

/** Checked against when the e-mail is unknown, so that answer takes as long as a wrong password. */
let dummyHash: Promise<string> | undefined;

/** A Passport instance of the app's own (no global state shared between test apps). */
export function createPassport(db: Knex): PassportStatic {
  const users = usersRepository(db);
  const passport = new Passport() as PassportStatic;
  passport.use(
    new LocalStrategy({ usernameField: 'email' }, async (email, password, done) => {
      try {
        const row = await users.findByEmail(email.trim());
        if (!row) {
          dummyHash ??= hashPassword('no account has this password');
          await verifyPassword(password, await dummyHash);
          return done(null, false);
        }
        if (!(await verifyPassword(password, row.password_hash))) return done(null, false);
        return done(null, toPublicUser(row));
      } catch (err) {
        return done(err);
      }
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser(async (id: number, done) => {
    try {
      const row = await users.findById(id);
      done(null, row ? toPublicUser(row) : false);
    } catch (err) {
      done(err);
    }
  });
  return passport;
}
