import { z } from 'zod';
import { priceBookSchema, type PriceBook } from '../../../../shared/api/pricing';
import { fractionToPercent, percentToFraction } from './percent';

const book = priceBookSchema.shape;

/** A percentage field over one of the book's fractions: its range messages are the server's. */
const percentOf = (fraction: z.core.$ZodType<number, number>, label: string) =>
  z
    .number({ message: `${label} must be a number` })
    .transform(percentToFraction)
    .pipe(fraction);

/**
 * Override rows (id + cost) over one of the book's `record` maps. A table of rows is what a person
 * edits; ids must be filled in and unique, because the record keeps only one cost per id.
 */
const overrideRows = (cost: z.core.$ZodType<number>, what: string) =>
  z
    .array(z.object({ id: z.string().trim().min(1, `Enter a ${what} id`), cost }))
    .superRefine((rows, ctx) => {
      const seen = new Set<string>();
      rows.forEach((row, index) => {
        if (seen.has(row.id)) {
          ctx.addIssue({
            code: 'custom',
            path: [index, 'id'],
            message: `${row.id} is listed twice`,
          });
        }
        seen.add(row.id);
      });
    })
    .transform((rows) => Object.fromEntries(rows.map((row) => [row.id, row.cost])));

/**
 * The price book form, derived from `priceBookSchema` (the server's): the same fields and messages,
 * with fractions typed as percentages and overrides as rows. Its output is a `PriceBook`, checked
 * by `priceBookSchema` itself, so what the form lets through is what the server accepts.
 */
export const priceBookFormSchema = z
  .object({
    currency: book.currency,
    lumber: z.object({
      defaultPerBoardFoot: book.lumber.shape.defaultPerBoardFoot,
      byLumber: overrideRows(book.lumber.shape.byLumber.def.innerType.def.valueType, 'lumber'),
    }),
    plates: z.object({
      defaultPerSquareInch: book.plates.shape.defaultPerSquareInch,
      byPlate: overrideRows(book.plates.shape.byPlate.def.innerType.def.valueType, 'plate'),
    }),
    labour: book.labour,
    deliveryCharge: book.deliveryCharge,
    margin: percentOf(book.margin, 'Margin'),
    taxRate: percentOf(book.taxRate, 'Tax rate'),
    depositRate: percentOf(book.depositRate, 'Deposit'),
    cancellationFee: book.cancellationFee.def.innerType,
    quoteValidityDays: z
      .number({ message: 'Enter a number of days' })
      .pipe(book.quoteValidityDays.def.innerType),
    terms: book.terms,
  })
  .transform((value, ctx): PriceBook => {
    // A transform runs only on a clean form; whatever the server's schema adds later
    // (cross-field rules) is then checked here too.
    const checked = priceBookSchema.safeParse(value);
    for (const issue of checked.error?.issues ?? []) {
      ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
    }
    return checked.data ?? value;
  });

/** What the price book form edits (percentages, override rows). */
export type PriceBookFormValues = z.input<typeof priceBookFormSchema>;

/** One editable override row. */
export interface OverrideRow {
  id: string;
  cost: number;
}

const rowsOf = (record: Record<string, number>): OverrideRow[] =>
  Object.entries(record).map(([id, cost]) => ({ id, cost }));

/** A stored book as form values: fractions as percentages, overrides as rows in stored order. */
export function priceBookToFormValues(stored: PriceBook): PriceBookFormValues {
  return {
    currency: stored.currency,
    lumber: {
      defaultPerBoardFoot: stored.lumber.defaultPerBoardFoot,
      byLumber: rowsOf(stored.lumber.byLumber),
    },
    plates: {
      defaultPerSquareInch: stored.plates.defaultPerSquareInch,
      byPlate: rowsOf(stored.plates.byPlate),
    },
    labour: { ...stored.labour },
    deliveryCharge: stored.deliveryCharge,
    margin: fractionToPercent(stored.margin),
    taxRate: fractionToPercent(stored.taxRate),
    depositRate: fractionToPercent(stored.depositRate),
    // A book saved before the fee existed keeps none: the server refunds it all (`?? 0`).
    cancellationFee: stored.cancellationFee ?? 0,
    quoteValidityDays: stored.quoteValidityDays,
    terms: stored.terms,
  };
}

/** Top-level names of the form, for `serverFieldErrors`. */
export const PRICE_BOOK_FIELDS = Object.keys(priceBookSchema.shape);

const OVERRIDE_PATHS = ['lumber.byLumber', 'plates.byPlate'] as const;

/**
 * The form field of a server message's path. The server names an override by its record key
 * (`lumber.byLumber.2x4 SPF No.2`, ids may hold dots), the form by its row (`lumber.byLumber.3.cost`).
 * Returns null when no field matches, so the message goes to the form's alert instead.
 */
export function formPathOfServerField(path: string, values: PriceBookFormValues): string | null {
  for (const prefix of OVERRIDE_PATHS) {
    if (path === prefix) return null;
    if (!path.startsWith(`${prefix}.`)) continue;
    const key = path.slice(prefix.length + 1);
    const rows = prefix === 'lumber.byLumber' ? values.lumber.byLumber : values.plates.byPlate;
    const index = rows.findIndex((row) => row.id.trim() === key);
    return index < 0 ? null : `${prefix}.${index}.cost`;
  }
  return PRICE_BOOK_FIELDS.includes(path.split('.')[0] ?? '') ? path : null;
}
