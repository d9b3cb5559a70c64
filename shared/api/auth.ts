// zod/mini: these schemas are on every page's first load (the classic API would add ~17 KB gz).
import * as z from 'zod/mini';
import { ROLES } from './roles';

/** Body of `POST /api/auth/login`. */
export const loginSchema = z.object({
  email: z.pipe(
    z.string({ error: 'Enter a valid e-mail address' }).check(z.trim(), z.toLowerCase()),
    z.email('Enter a valid e-mail address'),
  ),
  password: z
    .string({ error: 'Enter your password' })
    .check(z.minLength(1, 'Enter your password'), z.maxLength(200, 'Use at most 200 characters')),
});
export type LoginInput = z.infer<typeof loginSchema>;

/** The signed-in user as every endpoint presents it. */
export const sessionUserSchema = z.object({
  id: z.int(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  plantId: z.int(),
  customerId: z.nullable(z.int()),
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

export const plantSummarySchema = z.object({
  id: z.int(),
  name: z.string(),
  units: z.enum(['imperial', 'metric']),
  demo: z.boolean(),
});
export type PlantSummary = z.infer<typeof plantSummarySchema>;

/** `GET /api/auth/me` and the body of a successful login. */
export const meSchema = z.object({
  user: sessionUserSchema,
  plant: plantSummarySchema,
  customer: z.nullable(z.object({ id: z.int(), name: z.string() })),
});
export type Me = z.infer<typeof meSchema>;

/** Every error response: `{ error: { code, message, fields? } }`. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.optional(z.record(z.string(), z.string())),
    /** The request's id (also the X-Request-Id header): finds the request in the server's log. */
    requestId: z.optional(z.string()),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorSchema>;
