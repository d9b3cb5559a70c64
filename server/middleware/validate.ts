import type { RequestHandler } from 'express';
import { z } from 'zod';
import { badRequest } from '../errors';

/** Turn zod issues into `{ field: message }` the client shows beside each field. */
export function fieldMessages(error: z.core.$ZodError): Record<string, string> {
  // A Map, so a field named like an Object.prototype member (`constructor`, `__proto__`) is kept.
  const fields = new Map<string, string>();
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || '_';
    if (!fields.has(key)) fields.set(key, issue.message);
  }
  return Object.fromEntries(fields);
}

/** Parse `req.body` or `req.query` with a schema from shared/; the parsed value lands in res.locals. */
// Any zod schema, classic or zod/mini (the portal's shared schemas are mini: see shared/api/auth.ts).
export function validate<T extends z.core.$ZodType>(
  schema: T,
  source: 'body' | 'query' = 'body',
): RequestHandler {
  return (req, res, next) => {
    const parsed = z.safeParse(schema, source === 'body' ? (req.body ?? {}) : req.query);
    if (!parsed.success) {
      const fields = fieldMessages(parsed.error);
      const first = Object.values(fields)[0] ?? 'Check the highlighted fields.';
      return next(badRequest(first, fields));
    }
    res.locals[source] = parsed.data;
    next();
  };
}

/** Route ids are positive integers; anything else is simply not found. */
export function parseId(raw: unknown): number | null {
  const n = typeof raw === 'string' && /^\d{1,9}$/.test(raw) ? Number(raw) : NaN;
  return Number.isSafeInteger(n) && n > 0 ? n : null;
}
