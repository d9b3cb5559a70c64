import { z } from 'zod';
import type { TrussModel } from '../../shared/engine';

const num = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, `${label} must be finite`);
const id = (label: string) =>
  z.string({ error: `${label} must be a text id` }).min(1, `${label} must not be empty`);

/**
 * The `analyze` input: a plane truss in any consistent units. The shape is checked here; the
 * engine's own validation then checks the meaning (unknown joints, zero-length members, …).
 */
export const trussModelSchema: z.ZodType<TrussModel> = z.object(
  {
    joints: z.array(z.object({ id: id('Joint id'), x: num('Joint x'), y: num('Joint y') }), {
      error: 'joints must be a list of { id, x, y }',
    }),
    members: z.array(
      z.object({
        id: id('Member id').optional(),
        from: id('Member from'),
        to: id('Member to'),
        ea: num('Member ea').optional(),
      }),
      { error: 'members must be a list of { from, to, ea? }' },
    ),
    supports: z.array(
      z.object({
        joint: id('Support joint'),
        type: z.enum(['pin', 'roller'], { error: 'Support type must be pin or roller' }),
        normal: z.enum(['x', 'y'], { error: 'Roller normal must be x or y' }).optional(),
      }),
      { error: 'supports must be a list of { joint, type, normal? }' },
    ),
    loads: z
      .array(
        z.object({
          joint: id('Load joint'),
          fx: num('Load fx').optional(),
          fy: num('Load fy').optional(),
        }),
        { error: 'loads must be a list of { joint, fx?, fy? }' },
      )
      .optional(),
  },
  { error: 'The model must be an object with joints, members and supports' },
);
