import { Router, type Request } from 'express';
import passport from 'passport';
import { ipKeyGenerator } from 'express-rate-limit';
import { loginSchema, type LoginInput } from '../../../shared/api/auth';
import { validate } from '../../middleware/validate';
import { csrfToken, rotateCsrfToken } from '../../middleware/csrf';
import { requireUser } from '../../middleware/auth';
import { AppError } from '../../errors';
import { recordSignIn } from '../../commands/users';
import { User, Customer, Plant } from '../../models';
import { presentMe } from '../../presenters/user';
import { signInKeys, signInLimits } from '../../services/signInLimits';
import { handle } from '../load';

/** logIn as a promise. It regenerates the session id (fixation); the CSRF token is carried over. */
const signIn = (req: Request, user: User) =>
  new Promise<void>((resolve, reject) =>
    req.logIn(user, { keepSessionInfo: true } as passport.LogInOptions, (e) =>
      e ? reject(e as Error) : resolve(),
    ),
  );

/** Sign-in, sign-out, the session user and the CSRF token. */
export function authRouter(opts: {
  loginAttemptsPer15Min: number;
  loginAttemptsPerAddress: number;
}) {
  const router = Router();

  router.get('/csrf', (req, res) => {
    res.json({ token: csrfToken(req.session) });
  });

  // Failures are counted per address and e-mail (one person's typos never lock out a colleague),
  // and per address across e-mails; the counters are in PostgreSQL, shared by every app server.
  const limits = signInLimits(User.sequelize!, {
    perEmail: opts.loginAttemptsPer15Min,
    perAddress: opts.loginAttemptsPerAddress,
    windowSeconds: 15 * 60,
  });

  router.post(
    '/login',
    validate(loginSchema),
    handle(async (req, res, next) => {
      const body = res.locals.body as LoginInput;
      // The e-mail as validation normalised it (trimmed, lower case): padding is the same address.
      const keys = signInKeys(ipKeyGenerator(req.ip ?? ''), body.email);
      const wait = await limits.begin(keys);
      if (wait !== null) {
        res.set('Retry-After', String(wait));
        throw new AppError(
          429,
          'rate_limited',
          'Too many sign-in attempts. Wait 15 minutes and try again.',
        );
      }
      req.body = body;
      const user = await new Promise<User | false>((resolve, reject) =>
        passport.authenticate('local', (err: unknown, u: User | false) =>
          err ? reject(err as Error) : resolve(u),
        )(req, res, next),
      );
      if (!user) throw new AppError(401, 'bad_credentials', 'Wrong e-mail or password.');
      await limits.succeeded(keys);
      await signIn(req, user);
      rotateCsrfToken(req.session);
      await recordSignIn(user);
      const full = await User.findByPk(user.id, {
        include: [
          { model: Customer, as: 'customer' },
          { model: Plant, as: 'plant' },
        ],
      });
      res.json(presentMe(full!, req.app.locals.demo as boolean));
    }),
  );

  router.post('/logout', (req, res, next) => {
    req.logout({ keepSessionInfo: true }, (err) => {
      if (err) return next(err);
      rotateCsrfToken(req.session);
      res.status(204).end();
    });
  });

  router.get('/me', requireUser, (req, res) => {
    res.json(presentMe(req.user!, req.app.locals.demo as boolean));
  });

  return router;
}
