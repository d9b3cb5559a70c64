export { cutListQuerySchema, type CutListQuery } from '../../../shared/api/shop';
