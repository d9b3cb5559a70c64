import type pg from 'pg';
import { BaseError, ConnectionError } from 'sequelize';
import { logger } from '../logger';

/**
 * An idle pooled connection that the server ends (restart, failover, pg_terminate_backend) emits
 * 'error' on its pool; without a listener Node ends the process. Log it: the pool drops the client
 * and opens a fresh one on the next query.
 */
export function survivePoolErrors(pool: pg.Pool, name: string) {
  pool.on('error', (err) => logger.warn({ err, pool: name }, 'database connection lost'));
  return pool;
}

// SQLSTATE classes 08 (connection exception) and 57P (operator intervention: shutdown, terminate).
const UNAVAILABLE_SQLSTATE = /^(08|57P0[1-4])/;
const UNAVAILABLE_NODE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT']);
const UNAVAILABLE_MESSAGE =
  /Connection terminated|connection timeout|Client has encountered a connection error|terminating connection|the database system is (starting up|shutting down)/i;

/** Whether an error means the database is away (answer 503), not that the request was wrong. */
export function isDatabaseUnavailable(err: unknown): boolean {
  for (let e = err as Record<string, unknown> | undefined, depth = 0; e && depth < 4; depth++) {
    if (e instanceof ConnectionError) return true;
    const code = typeof e.code === 'string' ? e.code : '';
    if (UNAVAILABLE_SQLSTATE.test(code) || UNAVAILABLE_NODE_CODES.has(code)) return true;
    if (typeof e.message === 'string' && UNAVAILABLE_MESSAGE.test(e.message)) return true;
    // Sequelize wraps the driver's error as `parent`/`original`.
    e = (e instanceof BaseError ? (e as unknown as { parent?: unknown }).parent : e.cause) as
      Record<string, unknown> | undefined;
  }
  return false;
}
