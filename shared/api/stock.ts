import { z } from 'zod';

/**
 * The plant's lumber stock: per lumber (a size such as "2x4" for every grade, or one size and
 * grade such as "2x4 SPF-1/2"), the stock lengths it buys with a price each and, optionally, the
 * count on hand; the saw kerf and the end trim. Lengths in feet (stock) and inches (kerf, trim),
 * prices in dollars per board.
 */
export const stockLengthSchema = z.object({
  lengthFt: z
    .number({ error: 'Stock length must be a number of feet' })
    .min(2, 'Stock lengths start at 2 ft')
    .max(40, 'Stock lengths end at 40 ft'),
  price: z
    .number({ error: 'Price must be a number' })
    .positive('Price must be more than 0')
    .max(10_000, 'Price must be at most $10,000 a board'),
  onHand: z
    .number({ error: 'Count on hand must be a whole number' })
    .int('Count on hand must be a whole number')
    .min(0, 'Count on hand cannot be negative')
    .nullable()
    .default(null),
});

export const lumberStockSchema = z.object({
  lumber: z.string().trim().min(2, 'Name the lumber, e.g. 2x4').max(40),
  stocks: z
    .array(stockLengthSchema)
    .min(1, 'Give at least one stock length')
    .max(20)
    .refine(
      (list) => new Set(list.map((s) => s.lengthFt)).size === list.length,
      'Each stock length once per lumber',
    ),
});

export const stockSettingsSchema = z.object({
  kerfIn: z.number({ error: 'Kerf must be a number' }).min(0).max(1, 'Kerf is at most 1 in'),
  trimIn: z.number({ error: 'Trim must be a number' }).min(0).max(12, 'Trim is at most 12 in'),
  lumbers: z
    .array(lumberStockSchema)
    .min(1, 'Give the stock of at least one lumber')
    .max(60)
    .refine((list) => new Set(list.map((l) => l.lumber)).size === list.length, 'Each lumber once'),
});

export type StockLengthSetting = z.infer<typeof stockLengthSchema>;
export type LumberStock = z.infer<typeof lumberStockSchema>;
export type StockSettings = z.infer<typeof stockSettingsSchema>;

/** 8–20 ft in 2 ft steps (common practice), priced per foot with a premium for 14 ft and up. */
const demoLengths = (perFoot: number): StockLengthSetting[] =>
  [8, 10, 12, 14, 16, 18, 20].map((lengthFt) => ({
    lengthFt,
    price:
      Math.round(perFoot * (lengthFt >= 18 ? 1.14 : lengthFt >= 14 ? 1.06 : 1) * lengthFt * 100) /
      100,
    onHand: null,
  }));

/**
 * Demo stock (prices invented, not market data): what a plant without its own settings plans
 * with; the pages say so. Kerf 1/8 in (a common saw blade), trim 1/2 in per board.
 */
export const DEMO_STOCK_SETTINGS: StockSettings = {
  kerfIn: 0.125,
  trimIn: 0.5,
  lumbers: [
    { lumber: '2x4', stocks: demoLengths(0.62) },
    { lumber: '2x6', stocks: demoLengths(0.94) },
    { lumber: '2x8', stocks: demoLengths(1.31) },
    { lumber: '2x10', stocks: demoLengths(1.72) },
  ],
};

/** The stock a lumber id ("2x4 SPF-1/2") is cut from: its own entry, else its size's. */
export function stockFor(settings: StockSettings, lumberId: string): LumberStock | null {
  const size = lumberId.split(' ')[0];
  return (
    settings.lumbers.find((l) => l.lumber === lumberId) ??
    settings.lumbers.find((l) => l.lumber === size) ??
    null
  );
}
