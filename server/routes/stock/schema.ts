export { stockSettingsSchema, type StockSettings } from '../../../shared/api/stock';
