import { randomUUID } from 'node:crypto';
import { pinoHttp } from 'pino-http';
import { logger } from '../logger';

// A caller's own id (a load balancer's) is kept when it is short and plain; else we make one.
const PLAIN_ID = /^[\w.:-]{1,100}$/;

/**
 * One structured log line per request (pino-http) with a request id: taken from X-Request-Id or
 * made here, echoed in the X-Request-Id response header and in every error body
 * (`error.requestId`), so a user's report finds its line in the log.
 */
export const requestLog = pinoHttp({
  logger,
  genReqId: (req, res) => {
    const given = req.headers['x-request-id'];
    const id = typeof given === 'string' && PLAIN_ID.test(given) ? given : randomUUID();
    res.setHeader('X-Request-Id', id);
    return id;
  },
  customLogLevel: (_req, res, err) =>
    err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info',
  // Never log cookies or the CSRF token.
  serializers: {
    req: (req: { id: unknown; method: string; url: string }) => ({
      id: req.id,
      method: req.method,
      url: req.url,
    }),
  },
});
