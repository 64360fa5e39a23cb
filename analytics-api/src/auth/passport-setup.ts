import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { User } from '../db/entities/user.entity';
import { verifyPassword } from './passwords';

const toSessionUser = (u: User): Express.User => ({
  id: u.id, email: u.email, displayName: u.displayName, isAdmin: u.isAdmin,
  weightUnit: u.weightUnit, dateOrder: u.dateOrder,
});

export function configurePassport(db: DataSource): passport.PassportStatic {
  const users = db.getRepository(User);
  const p = new passport.Passport() as unknown as passport.PassportStatic;
  p.use(new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
    try {
      const user = await users.findOneBy({ email: email.trim().toLowerCase() });
      // Verify against a hash even for unknown e-mails would equalise timing; argon2's cost
      // dominates either way, and the rate limiter bounds guessing.
      if (!user || !(await verifyPassword(user.passwordHash, password))) return done(null, false);
      done(null, toSessionUser(user));
    } catch (e) {
      done(e);
    }
  }));
  p.serializeUser((user, done) => done(null, user.id));
  p.deserializeUser(async (id: number, done) => {
    try {
      const user = await users.findOneBy({ id });
      done(null, user ? toSessionUser(user) : false);
    } catch (e) {
      done(e);
    }
  });
  return p;
}
