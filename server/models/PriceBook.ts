import type { Sequelize } from 'sequelize';
import type { PriceBook as PriceBookData } from '../../shared/api/pricing';
import { PlantDocument, initPlantDocument } from './PlantDocument';

/** One plant's prices: lumber, plates, labour, delivery, margin, tax, deposit, validity. */
export class PriceBook extends PlantDocument<PriceBookData> {
  static initModel(sequelize: Sequelize) {
    initPlantDocument(PriceBook, sequelize, 'price_books');
  }
}
