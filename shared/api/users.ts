import { z } from 'zod';
import { ROLES } from './roles';

const password = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

/** Body of `POST /api/users` (plant manager adds a user). Builders need a customer. */
export const createUserSchema = z
  .object({
    email: z.string().trim().toLowerCase().email('Enter a valid e-mail address'),
    name: z.string().trim().min(1, 'Enter a name').max(120, 'Use at most 120 characters'),
    role: z.enum(ROLES, { message: 'Pick a role' }),
    password,
    customerId: z.number().int().positive().nullable().optional(),
  })
  .refine((u) => u.role !== 'builder' || !!u.customerId, {
    message: 'A builder user belongs to a builder company',
    path: ['customerId'],
  });
export type CreateUserInput = z.infer<typeof createUserSchema>;

/** Body of `PATCH /api/users/:id`. */
export const updateUserSchema = z
  .object({
    name: z
      .string()
      .trim()
      .min(1, 'Enter a name')
      .max(120, 'Use at most 120 characters')
      .optional(),
    role: z.enum(ROLES).optional(),
    active: z.boolean().optional(),
    password: password.optional(),
  })
  .refine((u) => Object.keys(u).length > 0, { message: 'Nothing to change' });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

export const userSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: z.enum(ROLES),
  active: z.boolean(),
  customerId: z.number().int().nullable(),
  customerName: z.string().nullable(),
  lastSignInAt: z.string().nullable(),
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;
