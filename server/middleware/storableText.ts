import type { RequestHandler } from 'express';
import { badRequest } from '../errors';

/** Deeper than any request of ours nests; deeper bodies are refused before anything walks them. */
const MAX_DEPTH = 32;

// A NUL, or half of a UTF-16 surrogate pair: PostgreSQL's text and JSONB cannot store either.
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
const unstorable = (s: string) => s.includes('\u0000') || LONE_SURROGATE.test(s);

const describe = (path: (string | number)[]) => path.join('.') || '_';

/**
 * Where in `value` a string or key PostgreSQL cannot store is, or the nesting is too deep: the
 * field path and message, or null when all of it is storable. Walks with its own stack, so a
 * deeply nested body cannot overflow the call stack.
 */
export function unstorableText(value: unknown): { field: string; message: string } | null {
  const stack: { v: unknown; path: (string | number)[] }[] = [{ v: value, path: [] }];
  while (stack.length) {
    const { v, path } = stack.pop()!;
    if (typeof v === 'string') {
      if (unstorable(v))
        return {
          field: describe(path),
          message: 'Text may not contain NUL characters or broken Unicode.',
        };
    } else if (v && typeof v === 'object') {
      if (path.length >= MAX_DEPTH)
        return { field: describe(path), message: 'The request is nested too deeply.' };
      for (const [k, child] of Object.entries(v)) {
        if (unstorable(k))
          return {
            field: describe(path),
            message: 'Field names may not contain NUL characters or broken Unicode.',
          };
        stack.push({ v: child, path: [...path, Array.isArray(v) ? Number(k) : k] });
      }
    }
  }
  return null;
}

/**
 * Part of validation for every API request: text in the JSON body or the query that PostgreSQL
 * cannot store answers 400 before any route runs (instead of a database error, a 500).
 */
export const requireStorableText: RequestHandler = (req, _res, next) => {
  const bad = unstorableText(req.body) ?? unstorableText(req.query);
  if (bad) return next(badRequest(bad.message, { [bad.field]: bad.message }));
  next();
};
