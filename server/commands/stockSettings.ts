import type { Transaction } from 'sequelize';
import { DEMO_STOCK_SETTINGS, type StockSettings as StockData } from '../../shared/api/stock';
import { StockSettings, User } from '../models';
import { savePlantDocument } from './plantDocument';

/** The plant's stored stock settings (with their editor), or null while it has none. */
export const findStockSettings = (plantId: number, t?: Transaction) =>
  StockSettings.findOne({
    where: { plantId },
    include: [{ model: User, as: 'editor' }],
    transaction: t,
  });

/** The stock a lumber plan uses: the stored settings, else the invented demo default (and says so). */
export async function stockFor(plantId: number, t?: Transaction) {
  const stored = await findStockSettings(plantId, t);
  return { settings: stored?.data ?? DEMO_STOCK_SETTINGS, demo: !stored };
}

/** Store the plant's stock settings (one row per plant), replacing the previous ones; audited. */
export async function saveStockSettings(actor: User, data: StockData) {
  return StockSettings.sequelize!.transaction(async (t) => {
    return savePlantDocument(StockSettings, 'stock_settings', actor, data, t);
  });
}
