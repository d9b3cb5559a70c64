export { priceBookSchema, type PriceBook } from '../../../shared/api/pricing';
