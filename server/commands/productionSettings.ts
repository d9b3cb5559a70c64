import type { Transaction } from 'sequelize';
import type { ProductionSettings as SettingsData } from '../../shared/api/production';
import { ProductionSettings, type User } from '../models';
import { savePlantDocument } from './plantDocument';
import { pricesFor } from './priceBook';

/**
 * The plant default when none is stored. INVENTED demo values: two tables, weekdays, 20 min set-up;
 * the labour model starts from the price book's (with no per-plate term and factor 1).
 */
export async function demoSettings(plantId: number, t?: Transaction): Promise<SettingsData> {
  const { book } = await pricesFor(plantId, t);
  return {
    tables: [
      { id: 1, name: 'Table 1', crew: 3, shifts: 1, hoursPerShift: 8 },
      { id: 2, name: 'Table 2', crew: 3, shifts: 1, hoursPerShift: 8 },
    ],
    workingDays: [1, 2, 3, 4, 5],
    closures: [],
    setupMinutes: 20,
    labour: {
      perTruss: book.labour.perTruss,
      perPiece: book.labour.perPiece,
      perJoint: book.labour.perJoint,
      perPlate: 0,
      factor: 1,
    },
    horizonDays: 84,
  };
}

/** The plant's stored settings, else the demo default (and says so). */
export async function settingsFor(plantId: number, t?: Transaction) {
  const stored = await ProductionSettings.findOne({ where: { plantId }, transaction: t });
  return {
    settings: stored?.data ?? (await demoSettings(plantId, t)),
    demo: !stored,
    updatedAt: stored?.updatedAt ?? null,
  };
}

/** Store the plant's production settings (one per plant); audited. Re-planning is the caller's. */
export async function saveSettings(actor: User, data: SettingsData, t: Transaction) {
  return savePlantDocument(ProductionSettings, 'production_settings', actor, data, t);
}
