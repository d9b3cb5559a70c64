import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from '../errors';
import { isDatabaseUnavailable } from '../db/resilience';
import { logger } from '../logger';

export const apiNotFound: RequestHandler = (_req, _res, next) =>
  next(new AppError(404, 'not_found', 'No such API endpoint.'));

/** Every error leaves as `{ error: { code, message, fields? } }`; nothing unexpected leaks. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const requestId = String(req.id ?? '');
  if (err instanceof AppError) {
    res
      .status(err.status)
      .json({ error: { code: err.code, message: err.message, fields: err.fields, requestId } });
    return;
  }
  // Two writers raced for one mark: the database's unique index decided.
  if (
    (err as { parent?: { constraint?: string } }).parent?.constraint === 'order_lines_mark_unique'
  ) {
    res.status(409).json({
      error: {
        code: 'duplicate_mark',
        message: 'That mark is already used in this order.',
        fields: { mark: 'That mark is already used in this order — pick another mark' },
      },
    });
    return;
  }
  // Body-parser errors (malformed JSON, too large) are the client's mistake.
  const status = (err as { status?: number; type?: string }).status;
  if (status && status >= 400 && status < 500) {
    const tooLarge = status === 413;
    res.status(status).json({
      error: {
        code: tooLarge ? 'too_large' : 'invalid',
        message: tooLarge ? 'The request is too large.' : 'The request body is not valid JSON.',
        requestId,
      },
    });
    return;
  }
  if (isDatabaseUnavailable(err)) {
    req.log?.warn({ err }, 'database unavailable');
    res
      .status(503)
      .set('Retry-After', '5')
      .json({
        error: {
          code: 'db_unavailable',
          message: 'The database is not reachable right now. Try again in a moment.',
          requestId,
        },
      });
    return;
  }
  (req.log ?? logger).error({ err }, 'unexpected error');
  res.status(500).json({
    error: {
      code: 'internal',
      message: 'Something went wrong on our side. Try again.',
      requestId,
    },
  });
};
