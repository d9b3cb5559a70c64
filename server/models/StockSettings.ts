import type { Sequelize } from 'sequelize';
import type { StockSettings as StockSettingsData } from '../../shared/api/stock';
import { PlantDocument, initPlantDocument } from './PlantDocument';

/** One plant's lumber stock: lengths, prices and counts on hand per lumber; kerf and trim. */
export class StockSettings extends PlantDocument<StockSettingsData> {
  static initModel(sequelize: Sequelize) {
    initPlantDocument(StockSettings, sequelize, 'stock_settings');
  }
}
