import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { RequestHandler } from 'express';
import { AppError } from '../errors';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

/** The session's synchronizer token, created on first use. */
export function csrfToken(session: { csrfToken?: string }) {
  session.csrfToken ??= randomBytes(24).toString('base64url');
  return session.csrfToken;
}

/** A new token at sign-in and sign-out: a token seen before the change of user stops working. */
export function rotateCsrfToken(session: { csrfToken?: string }) {
  session.csrfToken = randomBytes(24).toString('base64url');
  return session.csrfToken;
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Every non-GET request must echo the session's token in X-CSRF-Token. */
export const requireCsrf: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  const expected = req.session?.csrfToken;
  const got = req.get('x-csrf-token');
  const ok =
    !!expected &&
    !!got &&
    got.length === expected.length &&
    timingSafeEqual(Buffer.from(got), Buffer.from(expected));
  if (!ok)
    return next(
      new AppError(
        403,
        'csrf',
        'Your session token is missing or stale. Reload the page and try again.',
      ),
    );
  next();
};
