import type { StockSettings as StockData } from '../../shared/api/stock';
import type { StockSettings } from '../models';

/** The plant's stock settings as the client sees them: `demo` while they are invented defaults. */
export function presentStockSettings(stored: StockSettings | null, fallback: StockData) {
  return {
    ...(stored?.data ?? fallback),
    demo: !stored,
    updatedAt: stored?.updatedAt.toISOString() ?? null,
    updatedBy: stored?.editor?.name ?? null,
  };
}
