import { z } from 'zod';
import { ROLES } from './roles';

/** Body of `POST /api/auth/login`. */
export const loginSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter a valid e-mail address'),
  password: z.string().min(1, 'Enter your password').max(200, 'Use at most 200 characters'),
});
export type LoginInput = z.infer<typeof loginSchema>;

/** The signed-in user as every endpoint presents it. */
export const sessionUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  plantId: z.number().int(),
  customerId: z.number().int().nullable(),
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

export const plantSummarySchema = z.object({
  id: z.number().int(),
  name: z.string(),
  units: z.enum(['imperial', 'metric']),
  demo: z.boolean(),
});
export type PlantSummary = z.infer<typeof plantSummarySchema>;

/** `GET /api/auth/me` and the body of a successful login. */
export const meSchema = z.object({
  user: sessionUserSchema,
  plant: plantSummarySchema,
  customer: z.object({ id: z.number().int(), name: z.string() }).nullable(),
});
export type Me = z.infer<typeof meSchema>;

/** Every error response: `{ error: { code, message, fields? } }`. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
    /** The request's id (also the X-Request-Id header): finds the request in the server's log. */
    requestId: z.string().optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorSchema>;
