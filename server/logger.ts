import pino from 'pino';

/**
 * The process's structured log (JSON lines on stdout). LOG_LEVEL picks the level; tests are silent
 * unless LOG_LEVEL is set, so a failing test's output stays readable.
 */
export const logger = pino({
  level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === 'test' ? 'silent' : 'info'),
  base: { app: 'spanwise' },
});
