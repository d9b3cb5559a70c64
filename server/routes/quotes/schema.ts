export { quoteSchema, type Quote } from '../../../shared/api/pricing';
