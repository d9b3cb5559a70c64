import type { RequestHandler } from 'express';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import bcrypt from 'bcryptjs';
import { User, Customer, Plant } from '../models';
import { unauthorized } from '../errors';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // The signed-in user is the model instance itself.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends InstanceType<typeof import('../models/User').User> {}
  }
}

// A real hash to compare against when the e-mail is unknown, so timing does not tell.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', 10);

/** passport-local with e-mail + password; a deactivated user never signs in. */
export function configurePassport() {
  passport.use(
    new LocalStrategy(
      { usernameField: 'email', passwordField: 'password' },
      async (email, password, done) => {
        try {
          const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
          const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
          done(null, user && ok && user.active ? user : false);
        } catch (e) {
          done(e);
        }
      },
    ),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  // Loaded fresh on every request: a deactivated user's sessions stop working at once.
  passport.deserializeUser(async (id: number, done) => {
    try {
      const user = await User.findByPk(id, {
        include: [
          { model: Customer, as: 'customer' },
          { model: Plant, as: 'plant' },
        ],
      });
      done(null, user && user.active ? user : false);
    } catch (e) {
      done(e);
    }
  });
}

/** auth: the first step of every protected route. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(unauthorized());
  next();
};
