import { z } from 'zod';

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Use at most ${max} characters`)
    .transform((s) => (s === '' ? null : s))
    .nullable()
    .optional();

export const contactSchema = z.object({
  name: z.string().trim().min(1, 'Enter the contact’s name').max(120, 'Use at most 120 characters'),
  title: optionalText(80),
  email: z
    .string()
    .trim()
    .toLowerCase()
    .email('Enter a valid e-mail address')
    .nullable()
    .optional()
    .or(z.literal('').transform(() => null)),
  phone: optionalText(40),
});
export type Contact = z.infer<typeof contactSchema>;

const customerFields = z.object({
  name: z.string().trim().min(1, 'Enter the company name').max(160, 'Use at most 160 characters'),
  email: z.string().trim().toLowerCase().email('Enter a valid e-mail address'),
  phone: optionalText(40),
  terms: z.enum(['account', 'deposit'], { message: 'Pick credit account or deposit required' }),
  billingAddress: optionalText(400),
  city: optionalText(120),
  contacts: z.array(contactSchema).max(20, 'At most 20 contacts'),
});

/** Body of `POST /api/customers` — a builder company. */
export const createCustomerSchema = customerFields.extend({
  contacts: customerFields.shape.contacts.default([]),
  /** Create even though a builder with the same name or e-mail exists (the desk was asked). */
  confirmDuplicate: z.boolean().optional(),
});
export type CreateCustomerInput = z.infer<typeof createCustomerSchema>;

/** Body of `PATCH /api/customers/:id`: any of the create fields. */
// No defaults here: a field left out of a PATCH stays as it is.
export const updateCustomerSchema = customerFields
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UpdateCustomerInput = z.infer<typeof updateCustomerSchema>;

export const customerSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  phone: z.string().nullable(),
  terms: z.enum(['account', 'deposit']),
  billingAddress: z.string().nullable(),
  city: z.string().nullable(),
  contacts: z.array(contactSchema),
  jobCount: z.number().int(),
  createdAt: z.string(),
});
export type CustomerDetail = z.infer<typeof customerSchema>;
