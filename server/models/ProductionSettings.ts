import type { Sequelize } from 'sequelize';
import type { ProductionSettings as SettingsData } from '../../shared/api/production';
import { PlantDocument, initPlantDocument } from './PlantDocument';

/** One plant's production settings: tables, working days, closures, labour model. */
export class ProductionSettings extends PlantDocument<SettingsData> {
  static initModel(sequelize: Sequelize) {
    initPlantDocument(ProductionSettings, sequelize, 'production_settings');
  }
}
