import { z } from 'zod';

const positive = z.number().finite().positive();

/** The `cut` command's input: stock lengths, kerf, trim and pieces in one consistent unit. */
export const cutInputSchema = z
  .object({
    stocks: z
      .array(
        z
          .object({
            length: positive,
            cost: z.number().finite().nonnegative().optional(),
            available: z.number().int().nonnegative().optional(),
          })
          .strict(),
      )
      .min(1, 'Give at least one stock length.'),
    kerf: z.number().finite().nonnegative().optional(),
    trim: z.number().finite().nonnegative().optional(),
    pieces: z
      .array(
        z
          .object({
            length: positive,
            quantity: z.number().int().nonnegative(),
            id: z.union([z.string(), z.number()]).optional(),
          })
          .strict(),
      )
      .min(1, 'Give at least one piece.'),
  })
  .strict();

export type CutInput = z.infer<typeof cutInputSchema>;
