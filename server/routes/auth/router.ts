import { Router } from 'express';
import passport from 'passport';
import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import { loginSchema, type LoginInput } from '../../../shared/api/auth';
import { validate } from '../../middleware/validate';
import { csrfToken } from '../../middleware/csrf';
import { requireUser } from '../../middleware/auth';
import { AppError } from '../../errors';
import { recordSignIn } from '../../commands/users';
import { User, Customer, Plant } from '../../models';
import { presentMe } from '../../presenters/user';

/** Sign-in, sign-out, the session user and the CSRF token. */
export function authRouter(opts: { loginAttemptsPer15Min: number }) {
  const router = Router();

  router.get('/csrf', (req, res) => {
    res.json({ token: csrfToken(req.session) });
  });

  // Attempts are counted per address and e-mail, so one person's typos never lock out a colleague.
  const limiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: opts.loginAttemptsPer15Min,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) =>
      `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').toLowerCase()}`,
    handler: (_req, _res, next) =>
      next(
        new AppError(
          429,
          'rate_limited',
          'Too many sign-in attempts. Wait 15 minutes and try again.',
        ),
      ),
  });

  router.post('/login', limiter, validate(loginSchema), (req, res, next) => {
    req.body = res.locals.body as LoginInput;
    passport.authenticate('local', (err: unknown, user: User | false) => {
      if (err) return next(err);
      if (!user) return next(new AppError(401, 'bad_credentials', 'Wrong e-mail or password.'));
      // logIn regenerates the session id (fixation); the CSRF token is carried over.
      req.logIn(user, { keepSessionInfo: true } as passport.LogInOptions, async (loginErr) => {
        if (loginErr) return next(loginErr);
        try {
          await recordSignIn(user);
          const full = await User.findByPk(user.id, {
            include: [
              { model: Customer, as: 'customer' },
              { model: Plant, as: 'plant' },
            ],
          });
          res.json(presentMe(full!, req.app.locals.demo as boolean));
        } catch (e) {
          next(e);
        }
      });
    })(req, res, next);
  });

  router.post('/logout', (req, res, next) => {
    req.logout({ keepSessionInfo: true }, (err) => {
      if (err) return next(err);
      res.status(204).end();
    });
  });

  router.get('/me', requireUser, (req, res) => {
    res.json(presentMe(req.user!, req.app.locals.demo as boolean));
  });

  return router;
}
