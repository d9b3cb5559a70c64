import type { RequestHandler } from 'express';
import { notFound } from '../errors';
import { parseId } from '../middleware/validate';
import type { User } from '../models';

/** load: find the record named by :param within the actor's scope; anything else answers 404. */
export function load<R>(
  what: string,
  find: (id: number, actor: User) => Promise<R | null>,
  param = 'id',
): RequestHandler {
  return async (req, res, next) => {
    try {
      const id = parseId(req.params[param]);
      const record = id === null ? null : await find(id, req.user!);
      if (!record) return next(notFound(what));
      res.locals.record = record;
      next();
    } catch (e) {
      next(e);
    }
  };
}

/** Wrap an async handler so a rejection reaches the error handler. */
export const handle =
  (fn: RequestHandler): RequestHandler =>
  async (req, res, next) => {
    try {
      await fn(req, res, next);
    } catch (e) {
      next(e);
    }
  };
